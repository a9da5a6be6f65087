package org.nodewright;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Inherited;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.boot.webmvc.test.autoconfigure.WebMvcTest;
import org.springframework.context.annotation.ComponentScan;
import org.springframework.context.annotation.FilterType;

/**
 * A web-layer slice (MockMvc, no server, no store) for the benches whose controllers never touch
 * the saved designs: the components of the packages {@link StoreFreeWebLayer} names (and no other
 * controller), with the local-mode security chain. One configuration for all such classes, so it starts once.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@Documented
@Inherited
@WebMvcTest(properties = {TestProperties.NO_WARM_UP, TestProperties.NO_BANNER}, useDefaultFilters = false,
        includeFilters = @ComponentScan.Filter(type = FilterType.CUSTOM, classes = StoreFreeWebLayer.class))
public @interface StoreFreeWebTest {
}
