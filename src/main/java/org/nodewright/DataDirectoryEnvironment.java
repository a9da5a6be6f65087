package org.nodewright;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.springframework.boot.EnvironmentPostProcessor;
import org.springframework.boot.SpringApplication;
import org.springframework.core.env.ConfigurableEnvironment;
import org.springframework.core.env.MapPropertySource;

/**
 * Resolves {@code app.data-dir} (default {@code ./data}) to an absolute, existing folder and
 * publishes it as {@code app.data-dir.absolute}, since H2 refuses a bare relative file path.
 */
public class DataDirectoryEnvironment implements EnvironmentPostProcessor {

    @Override
    public void postProcessEnvironment(ConfigurableEnvironment environment, SpringApplication application) {
        String configured = environment.getProperty("app.data-dir", "./data");
        Path dir = Path.of(configured).toAbsolutePath().normalize();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("Cannot create the data directory " + dir, e);
        }
        environment.getPropertySources().addLast(new MapPropertySource("nodewrightDataDirectory",
                Map.of("app.data-dir.absolute", dir.toString().replace('\\', '/'))));
    }
}
