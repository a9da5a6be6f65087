package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.boot.SpringApplication;
import org.springframework.boot.context.config.ConfigDataEnvironmentPostProcessor;
import org.springframework.core.env.MapPropertySource;
import org.springframework.core.env.StandardEnvironment;

/** The bind address chosen from the packaged application.properties and the command line. */
class LanBindAddressTest {

    private static String address(Map<String, Object> commandLine) {
        StandardEnvironment environment = new StandardEnvironment();
        environment.getPropertySources().addFirst(new MapPropertySource("commandLineArgs", commandLine));
        ConfigDataEnvironmentPostProcessor.applyTo(environment);
        new LanBindAddress().postProcessEnvironment(environment, new SpringApplication());
        return environment.getProperty("server.address");
    }

    @Test
    void localModeListensOnLoopbackOnly() {
        assertThat(address(Map.of())).isEqualTo("127.0.0.1");
        assertThat(address(Map.of("app.sharing.lan", "false"))).isEqualTo("127.0.0.1");
    }

    @Test
    void lanModeListensOnAllInterfaces() {
        assertThat(address(Map.of("app.sharing.lan", "true"))).isEqualTo("0.0.0.0");
    }

    @Test
    void anExplicitAddressWinsInLanMode() {
        assertThat(address(Map.of("app.sharing.lan", "true", "server.address", "192.168.1.20")))
                .isEqualTo("192.168.1.20");
        assertThat(address(Map.of("app.sharing.lan", "true", "server.address", "127.0.0.1")))
                .isEqualTo("127.0.0.1");
    }
}
