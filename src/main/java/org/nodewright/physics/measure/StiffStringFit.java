package org.nodewright.physics.measure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.MultivariateJacobianFunction;
import org.hipparchus.util.Pair;
import org.nodewright.physics.tuning.Cents;

/**
 * Least-squares fit of f1 and B in f_n = n·f1·√(1+B·n²) (Fletcher 1964, eq. 11) to measured
 * partials, with Hipparchus' Levenberg–Marquardt optimiser (J. J. Moré, "The Levenberg–Marquardt
 * algorithm: implementation and theory", 1978), started from the closed-form line fit. Residuals
 * are in cents, so every partial counts by its pitch error. A partial more than five robust
 * standard deviations (1.4826 × median absolute residual, common practice) and more than 3 cents
 * off is set aside and the fit repeated, at most a quarter of the partials in all.
 */
public final class StiffStringFit {

    private static final int MAX_EVALUATIONS = 200;
    private static final int MAX_ITERATIONS = 100;
    private static final double OUTLIER_SIGMAS = 5.0;
    private static final double OUTLIER_MIN_CENTS = 3.0;

    private StiffStringFit() {
    }

    /**
     * @param partials at least two partials with distinct mode numbers
     * @return the fit and each partial's residual
     * @throws UnreadableInputException when fewer than two distinct partials are given
     */
    public static PartialFit fit(List<MatchedPartial> partials) {
        long distinct = partials.stream().mapToInt(MatchedPartial::n).distinct().count();
        if (distinct < 2) {
            throw new UnreadableInputException("at least two partials with different mode numbers are needed for a fit, found "
                    + distinct);
        }
        boolean[] used = new boolean[partials.size()];
        Arrays.fill(used, true);
        int maxDropped = partials.size() / 4;
        double[] fb = solve(partials, used);
        for (int dropped = 0; dropped < maxDropped; dropped++) {
            double[] res = residuals(partials, fb);
            int worst = -1;
            double[] abs = new double[partials.size()];
            int m = 0;
            for (int i = 0; i < res.length; i++) {
                if (used[i]) {
                    abs[m++] = Math.abs(res[i]);
                    if (worst < 0 || Math.abs(res[i]) > Math.abs(res[worst])) {
                        worst = i;
                    }
                }
            }
            double[] a = Arrays.copyOf(abs, m);
            Arrays.sort(a);
            double sigma = 1.4826 * a[m / 2];
            double w = Math.abs(res[worst]);
            if (w <= OUTLIER_MIN_CENTS || w <= OUTLIER_SIGMAS * sigma || m <= 3) {
                break;
            }
            used[worst] = false;
            fb = solve(partials, used);
        }
        double[] res = residuals(partials, fb);
        List<FittedPartial> out = new ArrayList<>();
        double ss = 0;
        int m = 0;
        for (int i = 0; i < partials.size(); i++) {
            MatchedPartial p = partials.get(i);
            out.add(new FittedPartial(p.n(), p.frequencyHz(), p.levelDb(),
                    StiffStringLaw.frequency(p.n(), fb[0], fb[1]), res[i], used[i]));
            if (used[i]) {
                ss += res[i] * res[i];
                m++;
            }
        }
        return new PartialFit(fb[0], fb[1], Math.sqrt(ss / m), fb[2], fb[3], out);
    }

    private static double[] residuals(List<MatchedPartial> partials, double[] fb) {
        double[] r = new double[partials.size()];
        for (int i = 0; i < r.length; i++) {
            MatchedPartial p = partials.get(i);
            r[i] = Cents.between(p.frequencyHz(), StiffStringLaw.frequency(p.n(), fb[0], fb[1]));
        }
        return r;
    }

    /** @return {f1, B, σ(f1), σ(B)} */
    private static double[] solve(List<MatchedPartial> all, boolean[] used) {
        List<MatchedPartial> ps = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            if (used[i]) {
                ps.add(all.get(i));
            }
        }
        int m = ps.size();
        int[] n = new int[m];
        double[] hz = new double[m];
        for (int i = 0; i < m; i++) {
            n[i] = ps.get(i).n();
            hz[i] = ps.get(i).frequencyHz();
        }
        double[] start = StiffStringLaw.lineFit(n, hz, m);
        double c = Cents.PER_NATURAL_LOG;
        // Model: cents of the law above 1 Hz, c·ln(n·f1·√(1+B·n²)); target: c·ln(measured).
        MultivariateJacobianFunction model = point -> {
            double f1 = point.getEntry(0);
            double b = point.getEntry(1);
            RealVector value = new ArrayRealVector(m);
            RealMatrix jacobian = new Array2DRowRealMatrix(m, 2);
            for (int i = 0; i < m; i++) {
                double nn = (double) n[i] * n[i];
                double s = 1 + b * nn;
                value.setEntry(i, c * (Math.log(n[i] * f1) + 0.5 * Math.log(s)));
                jacobian.setEntry(i, 0, c / f1);
                jacobian.setEntry(i, 1, c * 0.5 * nn / s);
            }
            return new Pair<>(value, jacobian);
        };
        double[] target = new double[m];
        double[] sigma = new double[m];
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < m; i++) {
            target[i] = c * Math.log(hz[i]);
            sigma[i] = Math.pow(10, -ps.get(i).levelDb() / 20) / hz[i]; // Rife & Boorstyn 1974, up to a constant
            best = Math.min(best, sigma[i]);
        }
        double[] weights = new double[m];
        for (int i = 0; i < m; i++) {
            double s = Math.max(sigma[i], 0.01 * best) / best;
            weights[i] = 1 / (s * s);
        }
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(new double[] {start[0], Math.max(start[1], 1e-9)})
                .model(model)
                .target(target)
                .weight(new org.hipparchus.linear.DiagonalMatrix(weights))
                .parameterValidator(p -> {
                    // B below 0 has no physical meaning for a string; f1 must stay positive.
                    p.setEntry(0, Math.max(p.getEntry(0), 1e-6));
                    p.setEntry(1, Math.max(p.getEntry(1), 0.0));
                    return p;
                })
                .maxEvaluations(MAX_EVALUATIONS)
                .maxIterations(MAX_ITERATIONS)
                .lazyEvaluation(false)
                .build();
        LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer().optimize(problem);
        RealVector p = opt.getPoint();
        double sf = Double.NaN;
        double sb = Double.NaN;
        if (m > 2) {
            try {
                RealVector sd = opt.getSigma(1e-14);
                // Weighted residuals are in units of the best partial's cents; scale by their spread.
                double scale = opt.getRMS() * Math.sqrt((double) m / (m - 2));
                sf = sd.getEntry(0) * scale;
                sb = sd.getEntry(1) * scale;
            } catch (RuntimeException singular) {
                // Leave the uncertainties unknown (NaN) when the covariance is singular.
            }
        }
        return new double[] {p.getEntry(0), p.getEntry(1), sf, sb};
    }
}
