package org.nodewright.physics.measure;

/**
 * An extremum of a measured impedance curve.
 *
 * @param frequencyHz   interpolated frequency (parabola through the extreme point and its neighbours in
 *                      log magnitude)
 * @param magnitude     magnitude at that frequency, the curve's unit
 * @param prominenceDb  how far the extremum stands out from its surroundings
 * @param q             f0 / half-power bandwidth, NaN when the curve does not fall by 3 dB on both sides
 */
public record ImpedancePeak(double frequencyHz, double magnitude, double prominenceDb, double q) {
}
