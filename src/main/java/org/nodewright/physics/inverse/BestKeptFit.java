package org.nodewright.physics.inverse;

import java.util.function.BooleanSupplier;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.MultivariateJacobianFunction;
import org.hipparchus.optim.nonlinear.vector.leastsquares.ParameterValidator;

/**
 * The one Levenberg-Marquardt run of the solvers that keep the best point they have seen (Hipparchus'
 * {@link LevenbergMarquardtOptimizer}; Levenberg 1944, Marquardt 1963): the model records its best point as it
 * goes, and the run ends when {@code goodEnough} holds, when the model throws {@link EvaluationCap} (its budget of
 * evaluations is spent, see {@link #spend}) or when the optimiser can improve no further. The caller then reads the
 * best point from its own model. Used by the tone-hole solver, the bar undercut tuner, the plate thickness tuner
 * and the plate's elastic fit.
 */
public final class BestKeptFit {

    private BestKeptFit() {
    }

    /** Thrown by a model whose evaluations are spent; ends the run with the best point kept. */
    public static final class EvaluationCap extends RuntimeException {
        private static final long serialVersionUID = 1L;

        public EvaluationCap() {
            super(null, null, false, false);
        }
    }

    /**
     * Runs the optimiser from {@code start} towards zero residuals.
     *
     * @param validator clamps a trial point into its bounds, or null for none
     * @return the optimiser's iterations, 0 when the run ended by the cap or by a stall
     */
    public static int run(MultivariateJacobianFunction model, int residuals, double[] start,
            ParameterValidator validator, BooleanSupplier goodEnough) {
        LeastSquaresBuilder builder = new LeastSquaresBuilder()
                .model(model)
                .target(new double[residuals])
                .start(start)
                .checker((iteration, previous, current) -> goodEnough.getAsBoolean())
                .maxEvaluations(Integer.MAX_VALUE)
                .maxIterations(Integer.MAX_VALUE)
                .lazyEvaluation(false);
        if (validator != null) {
            builder.parameterValidator(validator);
        }
        try {
            return new LevenbergMarquardtOptimizer().optimize(builder.build()).getIterations();
        } catch (MathIllegalStateException | EvaluationCap e) {
            return 0; // the optimiser could not improve further, or the cap: the model holds the best seen
        }
    }

    /**
     * The check before one more evaluation: a requested cancel throws {@link SolveCancelledException}, a spent
     * budget ({@code evaluations >= max}) throws {@link EvaluationCap}.
     */
    public static void spend(int evaluations, int max, BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new SolveCancelledException();
        }
        if (evaluations >= max) {
            throw new EvaluationCap();
        }
    }
}
