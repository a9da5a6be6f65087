package org.nodewright.physics.aircolumn;

/**
 * Something the reader of an analysis should know, as a code with its figures; the web layer words
 * it ({@code messages/aircolumns.properties}, keys {@code air.warning.*}).
 */
public sealed interface AirColumnWarning {

    /** More resonances lie in range than are listed: only the lowest {@code listed}. */
    record ResonanceCap(int listed) implements AirColumnWarning {
    }

    /** A fingering's wanted register was not found in the analysed range (fingering name may be null). */
    record RegisterNotFound(String fingering, int register, double fMinHz, double fMaxHz) implements AirColumnWarning {
    }

    /** ka above 1.84 (the first cross-mode cut-on of a circular duct): the plane-wave model is no longer exact. */
    record CrossModes(double ka) implements AirColumnWarning {
    }

    /** The air temperature lies outside 0..30 °C, the range of Cramer's 1993 speed-of-sound fit. */
    record OutsideSpeedFit(double temperatureC) implements AirColumnWarning {
    }
}
