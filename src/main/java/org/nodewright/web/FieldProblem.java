package org.nodewright.web;

import java.math.BigDecimal;
import java.math.MathContext;

/** One offending field of a request: a dotted path (e.g. {@code segments[2].lengthMm}) and why. */
public record FieldProblem(String field, String message) {

    /**
     * A figure for a message: at most six significant digits and no binary noise (647.7, not
     * 647.6999999999999, for 25.5 inch typed on a page).
     */
    public static String figure(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        return new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }
}
