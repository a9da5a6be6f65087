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
 * Resolves {@code app.data-dir} (default {@code ./data}) to an absolute, existing folder and
 * publishes it as {@code app.data-dir.absolute}, since H2 refuses a bare relative file path.
 * Resolved when read, not when the environment is prepared, so that property sources added later
 * (a test's {@code @DynamicPropertySource}) are honoured.
 */
public class DataDirectoryEnvironment implements EnvironmentPostProcessor {

    static final String ABSOLUTE = "app.data-dir.absolute";

    @Override
    public void postProcessEnvironment(ConfigurableEnvironment environment, SpringApplication application) {
        environment.getPropertySources().addLast(new DataDirectorySource(environment));
    }

    static String absolute(String configured) {
        Path dir = Path.of(configured).toAbsolutePath().normalize();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("Cannot create the data directory " + dir, e);
        }
        return dir.toString().replace('\\', '/');
    }

    /**
     * Answers {@code app.data-dir.absolute} only. Its source object is a plain marker, never the
     * environment itself (Boot walks an Environment-backed source as nested property sources).
     */
    private static final class DataDirectorySource extends PropertySource<Object> {

        private final ConfigurableEnvironment environment;

        DataDirectorySource(ConfigurableEnvironment environment) {
            super("nodewrightDataDirectory", new Object());
            this.environment = environment;
        }

        @Override
        public Object getProperty(String name) {
            return ABSOLUTE.equals(name) ? absolute(environment.getProperty("app.data-dir", "./data")) : null;
        }
    }
}
