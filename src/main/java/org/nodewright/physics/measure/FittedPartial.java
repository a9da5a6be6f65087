package org.nodewright.physics.measure;

/**
 * A matched partial beside the fitted law.
 *
 * @param n              mode number
 * @param frequencyHz    measured frequency
 * @param levelDb        measured level, dB re full scale (0 when unknown)
 * @param fittedHz       n·f1·√(1+B·n²) with the fitted f1 and B
 * @param residualCents  measured minus fitted, in cents
 * @param usedInFit      false when the partial was set aside as an outlier
 */
public record FittedPartial(int n, double frequencyHz, double levelDb, double fittedHz, double residualCents,
        boolean usedInFit) {
}
