package org.nodewright.physics.measure;

/**
 * A measured input-impedance curve: magnitude (in whatever unit the measurement used) and phase in
 * radians at strictly ascending frequencies.
 */
public record ImpedanceCurve(double[] frequencyHz, double[] magnitude, double[] phaseRad) {

    public ImpedanceCurve {
        if (frequencyHz.length != magnitude.length || frequencyHz.length != phaseRad.length) {
            throw new IllegalArgumentException("frequency, magnitude and phase need equal lengths, got "
                    + frequencyHz.length + ", " + magnitude.length + ", " + phaseRad.length);
        }
        if (frequencyHz.length < 3) {
            throw new IllegalArgumentException("an impedance curve needs at least 3 points, got " + frequencyHz.length);
        }
        frequencyHz = frequencyHz.clone();
        magnitude = magnitude.clone();
        phaseRad = phaseRad.clone();
    }

    @Override
    public double[] frequencyHz() {
        return frequencyHz.clone();
    }

    @Override
    public double[] magnitude() {
        return magnitude.clone();
    }

    @Override
    public double[] phaseRad() {
        return phaseRad.clone();
    }
}
