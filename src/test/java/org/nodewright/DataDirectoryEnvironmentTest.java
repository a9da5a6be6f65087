package org.nodewright;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.springframework.core.env.MapPropertySource;
import org.springframework.core.env.StandardEnvironment;

class DataDirectoryEnvironmentTest {

    @Test
    void aRelativeDataDirectoryBecomesAnAbsoluteExistingFolder(@TempDir Path tmp) {
        StandardEnvironment env = new StandardEnvironment();
        new DataDirectoryEnvironment().postProcessEnvironment(env, null);
        Path wanted = tmp.resolve("shop/data");
        // Added after the post-processor ran, as @DynamicPropertySource and late sources are.
        env.getPropertySources().addFirst(new MapPropertySource("late", Map.of("app.data-dir", wanted.toString())));

        String resolved = env.getProperty(DataDirectoryEnvironment.PROPERTY);

        assertThat(Path.of(resolved)).isAbsolute().isEqualTo(wanted.toAbsolutePath().normalize());
        assertThat(Files.isDirectory(wanted)).isTrue();
    }

    @Test
    void bootsPropertyBinderCanWalkTheSourcesAndFindsTheFolder(@TempDir Path tmp) {
        StandardEnvironment env = new StandardEnvironment();
        new DataDirectoryEnvironment().postProcessEnvironment(env, null);
        env.getPropertySources().addFirst(new MapPropertySource("late", Map.of("app.data-dir", tmp.toString())));
        // A source backed by the Environment itself would be walked as nested sources without end.
        assertThat(env.getPropertySources().get(DataDirectoryEnvironment.SOURCE_NAME).getSource())
                .isNotInstanceOf(org.springframework.core.env.Environment.class);
        org.springframework.boot.context.properties.source.ConfigurationPropertySources.attach(env);

        String bound = org.springframework.boot.context.properties.bind.Binder.get(env)
                .bind(DataDirectoryEnvironment.PROPERTY, String.class).get();

        assertThat(Path.of(bound)).isEqualTo(tmp.toAbsolutePath().normalize());
    }
}
