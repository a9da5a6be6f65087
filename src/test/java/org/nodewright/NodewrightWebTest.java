package org.nodewright;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Inherited;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ContextConfiguration;

/**
 * The whole application on a random port with MockMvc, its store in a temporary data directory
 * that is deleted when the context closes. Every class carrying only this annotation gets the same
 * configuration, so Spring's test context cache starts the application once for all of them.
 * Tests share that store: a test that counts designs empties the tables first.
 * Add properties (LAN mode, a profile) only where a test needs them: each distinct set is a context
 * of its own, with a data directory of its own.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@Documented
@Inherited
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = {
    TestProperties.NO_WARM_UP, TestProperties.NO_BANNER})
@AutoConfigureMockMvc
@ContextConfiguration(initializers = TemporaryDataDirectory.class)
public @interface NodewrightWebTest {
}
