package org.nodewright.physics.aircolumn;

/** Which ideal series the resonances are compared with for register alignment. */
public enum HarmonicSeries {
    /** f_n = n f_1: open or stopped-both-ends cylinders and complete cones (common practice). */
    HARMONIC,
    /** f_n = (2n - 1) f_1: a cylinder closed at one end and open at the other (common practice). */
    ODD;

    /** The series number of the n-th resonance (n from 1). */
    public int member(int n) {
        return this == ODD ? 2 * n - 1 : n;
    }

    /** Odd for a uniform cylinder with exactly one closed end, otherwise the full series. */
    public static HarmonicSeries of(AirColumn column) {
        boolean inClosed = column.inputEnd() == InputEnd.CLOSED;
        boolean outClosed = column.outputEnd() == OutputEnd.CLOSED;
        return column.isUniformCylinder() && inClosed != outClosed ? ODD : HARMONIC;
    }
}
