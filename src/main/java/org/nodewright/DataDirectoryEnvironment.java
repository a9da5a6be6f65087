package org.nodewright;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.springframework.boot.EnvironmentPostProcessor;
import org.springframework.boot.SpringApplication;
import org.springframework.core.env.ConfigurableEnvironment;
import org.springframework.core.env.PropertySource;

/**
 * Publishes {@code app.data-dir.absolute}: {@code app.data-dir} (default {@code ./data}) as an
 * absolute, existing folder, since H2 refuses a bare relative file path. The value is resolved
 * when it is read, not when this post-processor runs, so property sources added later (test
 * {@code @DynamicPropertySource}, for one) are honoured.
 */
public class DataDirectoryEnvironment implements EnvironmentPostProcessor {

    static final String PROPERTY = "app.data-dir.absolute";
    static final String SOURCE_NAME = "nodewrightDataDirectory";

    @Override
    public void postProcessEnvironment(ConfigurableEnvironment environment, SpringApplication application) {
        environment.getPropertySources().addLast(new AbsoluteDataDirectory(environment));
    }

    /**
     * Answers {@code app.data-dir.absolute} only. Its source object is a plain marker, never the
     * environment: Boot's configuration-property adapter walks a source whose object is an
     * Environment as nested property sources, which here would contain this very source and
     * never end (start-up spins until the heap is gone).
     */
    private static final class AbsoluteDataDirectory extends PropertySource<Object> {

        private final ConfigurableEnvironment environment;

        AbsoluteDataDirectory(ConfigurableEnvironment environment) {
            super(SOURCE_NAME, new Object());
            this.environment = environment;
        }

        @Override
        public Object getProperty(String name) {
            if (!PROPERTY.equals(name)) {
                return null;
            }
            String configured = environment.getProperty("app.data-dir", "./data");
            Path dir = Path.of(configured).toAbsolutePath().normalize();
            try {
                Files.createDirectories(dir);
            } catch (IOException e) {
                throw new UncheckedIOException("Cannot create the data directory " + dir, e);
            }
            return dir.toString().replace('\\', '/');
        }
    }
}
