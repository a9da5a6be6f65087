package org.nodewright.sheets;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.Collectors;

/** Numbers as a sheet prints them: significant digits without exponent noise, lists joined. */
public final class Figures {

    private Figures() {
    }

    /** {@code value} to {@code digits} significant digits (1.0E-4 and smaller, and 1e7 up, in exponent form). */
    public static String sig(double value, int digits) {
        if (!Double.isFinite(value)) {
            return "-";
        }
        double a = Math.abs(value);
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(digits));
        if (a != 0 && (a < 1e-3 || a >= 1e7)) {
            return String.format(java.util.Locale.ROOT, "%." + (digits - 1) + "e", value);
        }
        String s = rounded.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    public static String sig(Double value, int digits) {
        return value == null ? "-" : sig(value.doubleValue(), digits);
    }

    /** {@code value} with a fixed number of decimals and an explicit sign (cents: "+3.2", "-0.4"). */
    public static String signed(Double value, int decimals) {
        if (value == null || !Double.isFinite(value)) {
            return "-";
        }
        String s = String.format(java.util.Locale.ROOT, "%+." + decimals + "f", value);
        return Double.parseDouble(s) == 0 ? String.format(java.util.Locale.ROOT, "%." + decimals + "f", 0.0) : s;
    }

    /** A list of positions ("12.3, 45.6"), at most {@code max} of them then "…". */
    public static String list(List<Double> values, int digits, int max) {
        if (values == null || values.isEmpty()) {
            return "-";
        }
        String shown = values.stream().limit(max).map(v -> sig(v, digits)).collect(Collectors.joining(", "));
        return values.size() > max ? shown + ", ..." : shown;
    }

    /** Each value mapped (a unit change); NaN stays NaN. */
    public static double[] map(double[] values, DoubleUnaryOperator f) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = f.applyAsDouble(values[i]);
        }
        return out;
    }

    /** 1, 2, ... n as doubles (the x of a chart by partial or string number). */
    public static double[] counting(int n) {
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = i + 1;
        }
        return out;
    }
}
