package org.nodewright.designs;

import org.junit.jupiter.api.condition.EnabledIfEnvironmentVariable;
import org.nodewright.NodewrightWebTest;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * The same contract on a real PostgreSQL through the {@code postgres} profile and the same Flyway
 * migrations. Runs when NODEWRIGHT_PG_URL (and _USER, _PASSWORD) are set, as
 * e2e-tests/run-all-tests.sh does; skipped otherwise.
 */
@NodewrightWebTest
@ActiveProfiles("postgres")
@EnabledIfEnvironmentVariable(named = "NODEWRIGHT_PG_URL", matches = "jdbc:postgresql:.+")
class DesignApiPostgresTest extends DesignApiContract {

    @DynamicPropertySource
    static void database(DynamicPropertyRegistry registry) {
        registry.add("spring.datasource.url", () -> System.getenv("NODEWRIGHT_PG_URL"));
        registry.add("spring.datasource.username", () -> System.getenv("NODEWRIGHT_PG_USER"));
        registry.add("spring.datasource.password", () -> System.getenv().getOrDefault("NODEWRIGHT_PG_PASSWORD", ""));
    }
}
