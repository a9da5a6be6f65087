package org.nodewright.sharing;

import java.util.Map;
import org.springframework.boot.EnvironmentPostProcessor;
import org.springframework.boot.SpringApplication;
import org.springframework.core.env.ConfigurableEnvironment;
import org.springframework.core.env.MapPropertySource;
import org.springframework.core.env.PropertySource;

/**
 * In LAN mode ({@code app.sharing.lan=true}) the server listens on every interface (0.0.0.0)
 * instead of the packaged default 127.0.0.1, unless {@code server.address} was given explicitly
 * (command line, environment, an outside properties file), which always wins. LAN mode also always
 * speaks HTTPS (the SSL bundle of {@link LanTlsConfig}) with {@code Secure} session cookies; these
 * two go in ahead of every other source, so that no option turns plain HTTP back on for accounts.
 */
public class LanBindAddress implements EnvironmentPostProcessor {

    static final String ALL_INTERFACES = "0.0.0.0";
    static final String SOURCE_NAME = "nodewrightLanBindAddress";
    static final String TLS_SOURCE_NAME = "nodewrightLanTls";
    private static final String ATTACHED = "configurationProperties";

    @Override
    public void postProcessEnvironment(ConfigurableEnvironment environment, SpringApplication application) {
        if (!Boolean.parseBoolean(environment.getProperty("app.sharing.lan", "false"))) {
            return;
        }
        environment.getPropertySources().addFirst(new MapPropertySource(TLS_SOURCE_NAME, Map.of(
                "server.ssl.enabled", "true",
                "server.ssl.bundle", LanTlsConfig.BUNDLE,
                "server.servlet.session.cookie.secure", "true",
                "server.servlet.session.cookie.http-only", "true")));
        PropertySource<?> winner = null;
        for (PropertySource<?> source : environment.getPropertySources()) {
            // Skip the view that Spring Boot attaches over all the other sources.
            if (!ATTACHED.equals(source.getName()) && !TLS_SOURCE_NAME.equals(source.getName())
                    && source.containsProperty("server.address")) {
                winner = source;
                break;
            }
        }
        if (winner != null && !isPackagedDefault(winner)) {
            return; // given explicitly: keep it
        }
        MapPropertySource lan = new MapPropertySource(SOURCE_NAME, Map.of("server.address", ALL_INTERFACES));
        if (winner == null) {
            environment.getPropertySources().addLast(lan);
        } else {
            environment.getPropertySources().addBefore(winner.getName(), lan);
        }
    }

    /** The application.properties packaged in the jar (classpath root), which holds 127.0.0.1. */
    static boolean isPackagedDefault(PropertySource<?> source) {
        String name = source.getName();
        return name.contains("class path resource [application.properties]")
                && name.contains("optional:classpath:/");
    }
}
