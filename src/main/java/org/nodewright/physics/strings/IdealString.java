package org.nodewright.physics.strings;

/** The ideal flexible string fixed at both ends. */
public final class IdealString {

    private IdealString() {
    }

    /** f_n = n/(2L)·√(T/μ) (Mersenne's laws; any acoustics text, e.g. Fletcher &amp; Rossing eq. 2.14). */
    public static double frequencyHz(int n, double lengthM, double tensionN, double linearDensityKgPerM) {
        return n / (2 * lengthM) * Math.sqrt(tensionN / linearDensityKgPerM);
    }

    /** T = μ·(2·L·f1)², the same law solved for the tension. */
    public static double tensionN(double lengthM, double linearDensityKgPerM, double fundamentalHz) {
        double c = 2 * lengthM * fundamentalHz;
        return linearDensityKgPerM * c * c;
    }
}
