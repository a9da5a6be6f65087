package org.nodewright;

/** Properties every Spring test context sets. */
public final class TestProperties {

    /** The background JIT warm-up of the air-column solver only costs CPU in a test run. */
    public static final String NO_WARM_UP = "app.air-column.warm-up=false";

    public static final String NO_BANNER = "spring.main.banner-mode=off";

    private TestProperties() {
    }
}
