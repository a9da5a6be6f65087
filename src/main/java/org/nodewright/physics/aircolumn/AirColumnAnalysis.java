package org.nodewright.physics.aircolumn;

import java.util.List;
import org.nodewright.physics.tuning.Note;

/**
 * Everything computed for one bore: the impedance curve (divided by rho c / S_input), the
 * refined resonances with their profiles, the register alignment and the fingering predictions;
 * {@code mouth} is null without a mouth, {@code airAlongBore} empty without a breath, and
 * {@code air} is the room's air and {@code speedOfSound} the mean along the bore (the length over
 * the travel time; the room's speed without a breath).
 */
public record AirColumnAnalysis(AirProperties air, double[] frequencyHz, double[] magnitude, double[] phaseRad,
        List<ResonanceResult> resonances, HarmonicSeries series, List<FingeringResult> fingerings,
        List<AirColumnWarning> warnings, MouthEffect mouth, List<AirPoint> airAlongBore, double speedOfSound) {

    /**
     * The air inside at one point of the bore (with a breath).
     *
     * @param position        m from the input end
     * @param co2MoleFraction CO2 mole fraction
     */
    public record AirPoint(double position, double co2MoleFraction, AirProperties air) {
    }

    /**
     * One resonance with its nearest note, standing wave and register alignment.
     *
     * @param ratioToFirst    f_n / f_1
     * @param seriesMember    m in the ideal series (n, or 2n - 1 for the odd series)
     * @param centsFromSeries 1200 log2(f_n / (m f_1 / m_1)), m_1 the first member (1)
     */
    public record ResonanceResult(Resonance resonance, Note note, StandingWaveProfile profile,
            double ratioToFirst, int seriesMember, double centsFromSeries) {
    }

    /**
     * The predicted sounding pitch of a fingering (NaN when the wanted register was not found).
     */
    public record FingeringResult(Fingering fingering, double predictedHz, double centsFromTarget, Note note,
            double q) {
    }
}
