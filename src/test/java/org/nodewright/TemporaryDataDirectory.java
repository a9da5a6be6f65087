package org.nodewright;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Map;
import java.util.stream.Stream;
import org.springframework.beans.factory.support.DefaultListableBeanFactory;
import org.springframework.context.ApplicationContextInitializer;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.core.env.MapPropertySource;

/**
 * Gives a test application context its own {@code app.data-dir} in a fresh temporary folder, and
 * deletes the folder when the context is closed (at the end of the run, for a cached context).
 * The clean-up is registered as the context's first disposable bean, so it runs last, after the
 * connection pool and with it the H2 database have closed their files.
 */
public final class TemporaryDataDirectory implements ApplicationContextInitializer<ConfigurableApplicationContext> {

    static final String SOURCE = "nodewrightTestDataDirectory";

    @Override
    public void initialize(ConfigurableApplicationContext context) {
        Path dir;
        try {
            dir = Files.createTempDirectory("nodewright-test-");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        context.getEnvironment().getPropertySources()
                .addFirst(new MapPropertySource(SOURCE, Map.of("app.data-dir", dir.toString())));
        ((DefaultListableBeanFactory) context.getBeanFactory())
                .registerDisposableBean("nodewrightTestDataDirectoryCleanUp", () -> delete(dir));
    }

    static void delete(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
