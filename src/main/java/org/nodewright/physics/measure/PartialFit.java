package org.nodewright.physics.measure;

import java.util.List;

/**
 * The fitted stiff-string law and the partials it was fitted to.
 *
 * @param f1Hz             f1 of f_n = n·f1·√(1+B·n²)
 * @param inharmonicityB   Fletcher's B, at least 0
 * @param rmsCents         root mean square of the residuals of the partials used
 * @param f1StdErrorHz     standard error of f1 from the fit's covariance, NaN when unknown
 * @param bStdError        standard error of B, NaN when unknown
 * @param partials         every matched partial with its residual
 */
public record PartialFit(double f1Hz, double inharmonicityB, double rmsCents, double f1StdErrorHz,
        double bStdError, List<FittedPartial> partials) {

    public PartialFit {
        partials = List.copyOf(partials);
    }

    /** The sounding fundamental, f1·√(1+B) (Fletcher 1964, eq. 11 with n = 1). */
    public double fundamentalHz() {
        return StiffStringLaw.frequency(1, f1Hz, inharmonicityB);
    }
}
