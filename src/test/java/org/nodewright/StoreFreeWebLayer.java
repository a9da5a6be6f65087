package org.nodewright;

import java.util.List;
import org.springframework.core.type.classreading.MetadataReader;
import org.springframework.core.type.classreading.MetadataReaderFactory;
import org.springframework.core.type.filter.TypeFilter;

/**
 * Which components a {@link StoreFreeWebTest} slice holds beyond the controllers: every component
 * of the feature packages that need no store (their services, mappers, job runners, warm-up), the
 * shared web plumbing, and the local-mode security chain. A component of these packages that
 * starts to need the store makes the slice fail to start, which is the point.
 */
public final class StoreFreeWebLayer implements TypeFilter {

    static final List<String> PACKAGES = List.of("org.nodewright.strings.", "org.nodewright.aircolumns.",
            "org.nodewright.templates.", "org.nodewright.measurements.", "org.nodewright.inverse.",
            "org.nodewright.plates.", "org.nodewright.bars.",
            "org.nodewright.web.");

    static final String LOCAL_SECURITY = "org.nodewright.sharing.SecurityConfig";

    @Override
    public boolean match(MetadataReader reader, MetadataReaderFactory factory) {
        String name = reader.getClassMetadata().getClassName();
        return name.equals(LOCAL_SECURITY) || PACKAGES.stream().anyMatch(name::startsWith);
    }
}
