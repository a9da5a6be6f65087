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
    /** Longest text: sign, "0.", 15 leading zeros, 16 digits; generous. */
    static final int BUFFER = 48;

    @Override
    public void serialize(Object value, JsonGenerator gen, SerializationContext ctxt) throws JacksonException {
        double[] v = toArray(value);
        int decimals = decimalsFor(v);
        gen.writeStartArray(value, v.length);
        // One buffer and one power of ten per array; the digits go straight into the generator
        // (no String per number: this loop is most of a 24-mode string answer's server time).
        char[] buf = new char[BUFFER];
        double scale = Math.pow(10, decimals);
        for (double x : v) {
            if (!Double.isFinite(x) || Math.abs(x) * scale >= 9e15) {
                gen.writeNumber(x);
            } else {
                int len = format(x, decimals, scale, buf);
                gen.writeNumber(buf, 0, len);
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
        char[] buf = new char[BUFFER];
        int len = format(x, decimals, Math.pow(10, decimals), buf);
        out.append(buf, 0, len);
        return out.toString();
    }

    /**
     * The same text written into {@code buf} (at least {@link #BUFFER} long); returns its length.
     * {@code scale} is 10^decimals; |x|·scale must stay below 9e15 (the caller checks).
     */
    static int format(double x, int decimals, double scale, char[] buf) {
        long scaled = Math.round(Math.abs(x) * scale);
        if (scaled == 0) {
            buf[0] = '0';
            buf[1] = '.';
            buf[2] = '0';
            return 3;
        }
        // Digits of the scaled value, least significant first, into the end of the buffer.
        int p = BUFFER;
        int digitCount = 0;
        for (long r = scaled; r != 0; r /= 10) {
            buf[--p] = (char) ('0' + (int) (r % 10));
            digitCount++;
        }
        int fractionDigits = decimals;
        // Trailing zeros of the fraction dropped, one kept ("1.0").
        int kept = digitCount;
        while (fractionDigits > 1 && buf[p + kept - 1] == '0') {
            kept--;
            fractionDigits--;
        }
        int intDigits = digitCount - decimals;
        // The text is built at the front of the buffer while the digits are read from its end:
        // the text is at most 19 characters and the digits start at BUFFER - 16 or later, so the
        // two never meet.
        int n = 0;
        if (x < 0) {
            buf[n++] = '-';
        }
        if (intDigits <= 0) {
            buf[n++] = '0';
            buf[n++] = '.';
            for (int i = 0; i < -intDigits; i++) {
                buf[n++] = '0';
            }
            for (int i = 0; i < kept; i++) {
                buf[n++] = buf[p + i];
            }
        } else {
            for (int i = 0; i < intDigits; i++) {
                buf[n++] = buf[p + i];
            }
            buf[n++] = '.';
            if (decimals == 0) {
                buf[n++] = '0';
            } else {
                for (int i = intDigits; i < kept; i++) {
                    buf[n++] = buf[p + i];
                }
            }
        }
        return n;
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
