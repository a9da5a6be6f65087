package org.nodewright.physics.measure;

/**
 * Partial frequencies of a stiff string with pinned ends: f_n = n·f1·√(1 + B·n²)
 * (H. Fletcher, "Normal vibration frequencies of a stiff piano string", JASA 36(1), 1964, eq. 11).
 */
public final class StiffStringLaw {

    private StiffStringLaw() {
    }

    /** f_n = n·f1·√(1 + B·n²) (Fletcher 1964, eq. 11). */
    public static double frequency(int n, double f1Hz, double b) {
        return n * f1Hz * Math.sqrt(1 + b * n * n);
    }

    /**
     * Closed-form least-squares estimate of (f1, B) from (f_n/n)² = f1² + f1²·B·n², a straight line
     * in n² (Fletcher 1964, eq. 11 squared). Used to start the iterative fit and to predict partials
     * while matching. With one partial B is 0; a negative slope is taken as B = 0.
     *
     * @return {f1Hz, B}
     */
    public static double[] lineFit(int[] n, double[] hz, int count) {
        if (count < 1) {
            throw new IllegalArgumentException("at least one partial is needed, got " + count);
        }
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < count; i++) {
            double x = (double) n[i] * n[i];
            double r = hz[i] / n[i];
            double y = r * r;
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        double det = count * sxx - sx * sx;
        if (count < 2 || det <= 1e-12 * count * sxx) {
            return new double[] {Math.sqrt(sy / count), 0.0};
        }
        double slope = (count * sxy - sx * sy) / det;
        double intercept = (sy - slope * sx) / count;
        if (slope <= 0 || intercept <= 0) {
            return new double[] {Math.sqrt(sy / count), 0.0};
        }
        return new double[] {Math.sqrt(intercept), slope / intercept};
    }
}
