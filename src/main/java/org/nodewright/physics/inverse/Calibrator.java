package org.nodewright.physics.inverse;

import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;
import org.nodewright.physics.Require;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.tuning.Cents;

/**
 * Fits a model's uncertain parameters (a mouth's effective size, the air's temperature) to the
 * pitches a maker measured on a prototype: Levenberg–Marquardt (Hipparchus
 * {@link LevenbergMarquardtOptimizer}, after Moré 1978) on r_i = 1200 log2(f_model,i / f_measured,i),
 * a forward-difference Jacobian with a step of {@link #RELATIVE_STEP} of each parameter's range,
 * bounds enforced by clamping each trial point.
 */
public final class Calibrator {

    static final double RELATIVE_STEP = 1e-4;

    /** The model for a set of parameter values: the frequency a fingering sounds, searched near a guess. */
    @FunctionalInterface
    public interface Family {
        double soundingHz(double[] parameters, Fingering fingering, double guessHz);
    }

    /**
     * @param fitted   the parameter values found
     * @param before   cents of the model from each measured pitch at the start values
     * @param after    the same at the fitted values
     */
    public record Fit(double[] fitted, double[] before, double[] after, double[] modelBeforeHz, double[] modelAfterHz,
            int evaluations) {

        public double rmsAfter() {
            return rms(after);
        }

        public double rmsBefore() {
            return rms(before);
        }

        static double rms(double[] c) {
            double s = 0;
            for (double v : c) {
                s += v * v;
            }
            return Math.sqrt(s / c.length);
        }
    }

    private final int maxEvaluations;

    public Calibrator(int maxEvaluations) {
        this.maxEvaluations = Require.atLeastOne("maxEvaluations", maxEvaluations);
    }

    /**
     * @param measured fingerings whose targetHz is the pitch measured (the model is tracked from it)
     * @throws IllegalArgumentException when a fingering has no resonance near its measured pitch
     */
    public Fit fit(Family family, double[] start, double[] lower, double[] upper, List<Fingering> measured) {
        int p = start.length;
        if (lower.length != p || upper.length != p || measured.isEmpty()) {
            throw new IllegalArgumentException("need a start and bounds per parameter and at least one measurement");
        }
        int[] count = {0};
        java.util.function.Function<double[], double[]> hz = x -> {
            count[0]++;
            double[] f = new double[measured.size()];
            for (int i = 0; i < f.length; i++) {
                Fingering m = measured.get(i);
                f[i] = family.soundingHz(x, m, m.targetHz());
                if (!Double.isFinite(f[i])) {
                    throw new IllegalArgumentException("fingering " + m.name() + " has no resonance near its measured "
                            + m.targetHz() + " Hz");
                }
            }
            return f;
        };
        java.util.function.Function<double[], double[]> residuals = x -> {
            double[] f = hz.apply(x);
            double[] r = new double[f.length];
            for (int i = 0; i < r.length; i++) {
                r[i] = Cents.between(f[i], measured.get(i).targetHz());
            }
            return r;
        };
        double[] x0 = clamp(start, lower, upper);
        double[] beforeHz = hz.apply(x0);
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .model(point -> {
                    double[] x = point.toArray();
                    double[] r0 = residuals.apply(x);
                    double[][] j = new double[r0.length][p];
                    for (int k = 0; k < p; k++) {
                        double step = RELATIVE_STEP * (upper[k] - lower[k]);
                        double[] xs = x.clone();
                        xs[k] = xs[k] + step > upper[k] ? xs[k] - step : xs[k] + step;
                        double[] rs = residuals.apply(xs);
                        for (int i = 0; i < r0.length; i++) {
                            j[i][k] = (rs[i] - r0[i]) / (xs[k] - x[k]);
                        }
                    }
                    RealMatrix jac = new Array2DRowRealMatrix(j, false);
                    return new Pair<RealVector, RealMatrix>(new ArrayRealVector(r0, false), jac);
                })
                .target(new double[measured.size()])
                .start(x0)
                .parameterValidator(v -> new ArrayRealVector(clamp(v.toArray(), lower, upper), false))
                .maxEvaluations(maxEvaluations)
                .maxIterations(maxEvaluations)
                .lazyEvaluation(false)
                .build();
        double[] fitted;
        try {
            fitted = clamp(new LevenbergMarquardtOptimizer().optimize(problem).getPoint().toArray(), lower, upper);
        } catch (org.hipparchus.exception.MathIllegalStateException capReached) {
            throw new IllegalArgumentException("the fit did not settle within " + maxEvaluations + " evaluations");
        }
        double[] afterHz = hz.apply(fitted);
        double[] before = new double[measured.size()];
        double[] after = new double[measured.size()];
        for (int i = 0; i < after.length; i++) {
            before[i] = Cents.between(beforeHz[i], measured.get(i).targetHz());
            after[i] = Cents.between(afterHz[i], measured.get(i).targetHz());
        }
        return new Fit(fitted, before, after, beforeHz, afterHz, count[0]);
    }

    private static double[] clamp(double[] x, double[] lower, double[] upper) {
        double[] out = x.clone();
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.min(upper[i], Math.max(lower[i], out[i]));
        }
        return out;
    }
}
