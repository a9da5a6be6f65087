package org.nodewright.templates.render;

import java.util.Map;

/** Lets web tests reuse the SVG parsing helpers of {@link FretTemplateSvgTest}. */
public final class FretTemplateSvgTestAccess {

    private FretTemplateSvgTestAccess() {
    }

    public static Map<Integer, Double> fretXs(String svg) throws Exception {
        return FretTemplateSvgTest.fretXs(FretTemplateSvgTest.parse(svg));
    }
}
