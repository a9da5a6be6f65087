package org.nodewright.web;

import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.SerializationContext;
import tools.jackson.databind.ValueSerializer;

/**
 * Writes a sampled curve (a mode shape, a standing wave, its positions) to six significant digits
 * of the curve's largest magnitude: every number of the array gets the same count of decimals, so
 * a shape scaled to max |X| = 1 is written to 1e-5 and positions along a 650 mm string to 0.001 mm.
 * That is far finer than a chart or a marking gauge shows, and keeps the rounding noise of the
 * sampling ({@code 1.2246467991473532E-16} for sin(π)) out of the answer. Frequencies and the
 * contract's positions (nodes, antinodes) are never written through this class.
 *
 * <p>Put it on a {@code double[]} or {@code List<Double>} record component with
 * {@code @JsonSerialize(using = ChartPrecision.class)}. Non-finite values (none are expected) are
 * written as Jackson writes them by default.
 */
public final class ChartPrecision extends ValueSerializer<Object> {

    /** Significant digits kept of the largest magnitude in the array. */
    public static final int SIGNIFICANT_DIGITS = 6;
    private static final int MAX_DECIMALS = 15;

    @Override
    public void serialize(Object value, JsonGenerator gen, SerializationContext ctxt) throws JacksonException {
        double[] v = toArray(value);
        int decimals = decimalsFor(v);
        gen.writeStartArray(value, v.length);
        StringBuilder text = new StringBuilder(24);
        double scale = Math.pow(10, decimals);
        for (double x : v) {
            if (!Double.isFinite(x) || Math.abs(x) * scale >= 9e15) {
                gen.writeNumber(x);
            } else {
                text.setLength(0);
                gen.writeNumber(format(x, decimals, text));
            }
        }
        gen.writeEndArray();
    }

    /** Decimals giving {@link #SIGNIFICANT_DIGITS} significant digits of the largest finite magnitude. */
    static int decimalsFor(double[] v) {
        double max = 0;
        for (double x : v) {
            if (Double.isFinite(x)) {
                max = Math.max(max, Math.abs(x));
            }
        }
        if (max == 0) {
            return 1;
        }
        int exponent = (int) Math.floor(Math.log10(max));
        return Math.max(0, Math.min(MAX_DECIMALS, SIGNIFICANT_DIGITS - 1 - exponent));
    }

    /** x rounded half away from zero to {@code decimals} places, trailing zeros dropped, at least "d.d". */
    static String format(double x, int decimals, StringBuilder out) {
        long scaled = Math.round(Math.abs(x) * Math.pow(10, decimals));
        if (scaled == 0) {
            return "0.0";
        }
        if (x < 0) {
            out.append('-');
        }
        String digits = Long.toString(scaled);
        int intDigits = digits.length() - decimals;
        if (intDigits <= 0) {
            out.append("0.");
            out.append("0".repeat(-intDigits));
            out.append(digits);
        } else {
            out.append(digits, 0, intDigits).append('.');
            out.append(decimals == 0 ? "0" : digits.substring(intDigits));
        }
        int end = out.length();
        while (out.charAt(end - 1) == '0' && out.charAt(end - 2) != '.') {
            end--;
        }
        out.setLength(end);
        return out.toString();
    }

    private static double[] toArray(Object value) {
        if (value instanceof double[] a) {
            return a;
        }
        if (value instanceof List<?> list) {
            double[] out = new double[list.size()];
            for (int i = 0; i < out.length; i++) {
                Object o = list.get(i);
                out[i] = o == null ? Double.NaN : ((Number) o).doubleValue();
            }
            return out;
        }
        throw new IllegalArgumentException("ChartPrecision writes double[] or List<Double>, not " + value.getClass());
    }
}
