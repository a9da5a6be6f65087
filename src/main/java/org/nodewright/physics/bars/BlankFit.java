package org.nodewright.physics.bars;

import java.util.List;

/**
 * The elastic moduli that make the bar's model sound as the tapped blank did.
 *
 * @param youngsModulus Pa, fitted
 * @param shearModulus  Pa: fitted when {@code shearFitted}, else the value the fit started from
 * @param shearFitted   whether the measured modes determined G (two or more modes, Timoshenko theory, and
 *                      enough shear in the bar for G to move them; see {@link BlankFitter#SHEAR_SENSITIVITY_CENTS})
 * @param matches       each measured mode beside the fitted model's frequency
 * @param rmsCents      root mean square of the matches' cents
 * @param evaluations   model analyses spent
 */
public record BlankFit(double youngsModulus, double shearModulus, boolean shearFitted, List<Match> matches,
        double rmsCents, int evaluations) {

    public BlankFit {
        matches = List.copyOf(matches);
    }

    /** One measured mode and the fitted model's. */
    public record Match(int n, double measuredHz, double modelHz, double centsOff) {
    }
}
