package org.nodewright.physics.plates;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.util.Pair;
import org.nodewright.physics.Require;
import org.nodewright.physics.inverse.BestKeptFit;
import org.nodewright.physics.tuning.Cents;

/**
 * The elastic constants of a rectangular sample of sheet material from the frequencies of three modes of the free
 * plate, the method of McIntyre &amp; Woodhouse ("On measuring the elastic and damping constants of orthotropic sheet
 * materials", Acta Metallurgica 36, 1988): the twisting mode (1, 1) depends almost only on the shear modulus, the
 * long-grain bending mode (2, 0) on the stiffness along the grain and the cross-grain bending mode (0, 2) on the
 * stiffness across it. First the closed-form estimates of {@link FreePlateRelations}, then the three constants refined
 * by Levenberg–Marquardt (Hipparchus) until the Rayleigh–Ritz model of the same free plate ({@link PlateSolver})
 * sounds the measured frequencies; Poisson's ratio and density are held. A mode measured is matched to the computed
 * mode whose shape is most like the ideal one ({@link #shapeMatch}).
 */
public final class ElasticFit {

    /** The three modes of the method. */
    public enum Kind { TWISTING, ALONG, ACROSS }

    /** Stop when every measured mode is this close, cents. */
    static final double TOLERANCE_CENTS = 0.05;
    /** Evaluation cap (each a plate analysis of about 30 ms). */
    static final int MAX_EVALUATIONS = 60;
    /** Log-step of the forward differences. */
    static final double LOG_STEP = 1e-4;
    /** Modes analysed to find the three: the twisting, cross- and long-grain modes lie among the lowest six. */
    static final int MODES = 8;
    /** Below this shape match a mode is flagged as mixed with its neighbour (the ring and X pair). */
    public static final double MIXED_BELOW = 0.8;

    /**
     * @param material    the fitted constants (density and Poisson's ratio as given)
     * @param closedForm  the closed-form estimates (constants not measured are the start's)
     * @param computedHz  the fitted model's frequency of each measured kind
     * @param cents       computed against measured, cents
     * @param shapeMatch  how like the ideal shape the matched computed mode is, 0..1
     */
    public record Result(PlateMaterial material, PlateMaterial closedForm, Map<Kind, Double> computedHz,
            Map<Kind, Double> cents, Map<Kind, Double> shapeMatch, int evaluations) {
    }

    private final PlateSolver solver = new PlateSolver();

    /**
     * @param lengthM   sample length along the grain
     * @param widthM    sample width across the grain
     * @param thicknessM sample thickness
     * @param start     starting constants (a catalogue entry); its density and Poisson's ratio are replaced by
     *                  {@code density} and {@code poisson}
     * @param measuredHz the measured frequency of one, two or all three kinds; the constants of the kinds left out
     *                   stay at the start's
     */
    public Result fit(double lengthM, double widthM, double thicknessM, double density, double poisson,
            PlateMaterial start, Map<Kind, Double> measuredHz) {
        Require.positive("lengthM", lengthM);
        Require.positive("widthM", widthM);
        Require.positive("thicknessM", thicknessM);
        Require.positive("density", density);
        if (measuredHz.isEmpty()) {
            throw new IllegalArgumentException("at least one measured frequency is needed");
        }
        measuredHz.values().forEach(f -> Require.positive("measuredHz", f));
        List<Kind> kinds = new ArrayList<>(measuredHz.keySet());
        double ex = measuredHz.containsKey(Kind.ALONG)
                ? FreePlateRelations.elasticFromBeamMode(measuredHz.get(Kind.ALONG), lengthM, thicknessM, density)
                : start.elasticAlongPa();
        double ey = measuredHz.containsKey(Kind.ACROSS)
                ? FreePlateRelations.elasticFromBeamMode(measuredHz.get(Kind.ACROSS), widthM, thicknessM, density)
                : start.elasticAcrossPa();
        double g = measuredHz.containsKey(Kind.TWISTING)
                ? FreePlateRelations.shearFromTwisting(measuredHz.get(Kind.TWISTING), lengthM, widthM, thicknessM, density)
                : start.shearPa();
        PlateMaterial closed = material(density, ex, ey, g, poisson);
        Outline outline = Outline.rectangle(lengthM, widthM);
        double[] base = {Math.log(ex), Math.log(ey), Math.log(g)};
        int[] which = kinds.stream().mapToInt(k -> switch (k) {
            case ALONG -> 0;
            case ACROSS -> 1;
            case TWISTING -> 2;
        }).toArray();
        int[] evaluations = {0};
        Map<Kind, Double> lastMatch = new EnumMap<>(Kind.class);
        Map<Kind, Double> lastHz = new EnumMap<>(Kind.class);
        java.util.function.Function<double[], double[]> residuals = p -> {
            if (evaluations[0]++ >= MAX_EVALUATIONS) {
                throw new BestKeptFit.EvaluationCap();
            }
            double[] values = {ex, ey, g};
            for (int k = 0; k < which.length; k++) {
                values[which[k]] = Math.exp(p[k]);
            }
            PlateMaterial m = material(density, values[0], values[1], values[2], poisson);
            Map<Kind, double[]> found = identify(solver.analyze(new Plate(outline, m,
                    ThicknessField.uniform(thicknessM), EdgeCondition.FREE, List.of()), MODES), outline);
            double[] r = new double[kinds.size()];
            for (int i = 0; i < r.length; i++) {
                double[] hzAndMatch = found.get(kinds.get(i));
                r[i] = Cents.between(hzAndMatch[0], measuredHz.get(kinds.get(i)));
                lastHz.put(kinds.get(i), hzAndMatch[0]);
                lastMatch.put(kinds.get(i), hzAndMatch[1]);
            }
            return r;
        };
        double[] p0 = new double[which.length];
        for (int k = 0; k < which.length; k++) {
            p0[k] = base[which[k]];
        }
        double[][] bestP = {p0.clone()};
        double[] bestWorst = {Double.POSITIVE_INFINITY};
        BestKeptFit.run((RealVector point) -> {
                    double[] p = point.toArray();
                    double[] r0 = residuals.apply(p);
                    double worst = 0;
                    for (double v : r0) {
                        worst = Math.max(worst, Math.abs(v));
                    }
                    if (worst < bestWorst[0]) {
                        bestWorst[0] = worst;
                        bestP[0] = p.clone();
                    }
                    double[][] jac = new double[r0.length][p.length];
                    if (worst > TOLERANCE_CENTS) {
                        for (int j = 0; j < p.length; j++) {
                            double[] q = p.clone();
                            q[j] += LOG_STEP;
                            double[] r1 = residuals.apply(q);
                            for (int i = 0; i < r0.length; i++) {
                                jac[i][j] = (r1[i] - r0[i]) / LOG_STEP;
                            }
                        }
                    }
                    return new Pair<RealVector, RealMatrix>(new ArrayRealVector(r0), new Array2DRowRealMatrix(jac, false));
                }, kinds.size(), p0, null, () -> bestWorst[0] <= TOLERANCE_CENTS);
        double[] values = {ex, ey, g};
        for (int k = 0; k < which.length; k++) {
            values[which[k]] = Math.exp(bestP[0][k]);
        }
        PlateMaterial fitted = material(density, values[0], values[1], values[2], poisson);
        double[] check = residuals.apply(bestP[0].clone());
        Map<Kind, Double> cents = new EnumMap<>(Kind.class);
        for (int i = 0; i < kinds.size(); i++) {
            cents.put(kinds.get(i), check[i]);
        }
        return new Result(fitted, closed, new EnumMap<>(lastHz), cents, new EnumMap<>(lastMatch), evaluations[0]);
    }

    /**
     * A material with the given constants; Poisson's ratio lowered, if need be, so that the stiffness stays positive
     * definite (a fitted E across can fall below nu_xy² E along only for nonsense data).
     */
    private static PlateMaterial material(double density, double ex, double ey, double g, double poisson) {
        double nu = poisson;
        if (!PlateMaterial.isPositiveDefinite(ex, ey, nu)) {
            nu = Math.signum(poisson) * 0.99 * Math.sqrt(ex / ey);
        }
        return new PlateMaterial(density, ex, ey, g, nu);
    }

    /**
     * Each kind's computed mode: the one whose shape correlates best with the ideal shape on the centred coordinates
     * ξ = 2x/a − 1, η = 2y/b − 1 (twisting ξη; long-grain bending 3ξ² − 1; cross-grain bending 3η² − 1, the
     * Legendre P2 that the free–free beam's first mode resembles), each mode given to one kind at most, the best
     * matches first. Values: {frequency Hz, |correlation|}.
     */
    static Map<Kind, double[]> identify(PlateAnalysis analysis, Outline outline) {
        double[] b = outline.bounds();
        List<PlateMode> modes = analysis.modes();
        double[][] score = new double[Kind.values().length][modes.size()];
        for (int m = 0; m < modes.size(); m++) {
            ModeShape s = modes.get(m).shape();
            for (Kind k : Kind.values()) {
                score[k.ordinal()][m] = shapeMatch(s, b, k);
            }
        }
        Map<Kind, double[]> out = new EnumMap<>(Kind.class);
        boolean[] taken = new boolean[modes.size()];
        for (int round = 0; round < Kind.values().length; round++) {
            int bestK = -1;
            int bestM = -1;
            double best = -1;
            for (Kind k : Kind.values()) {
                if (out.containsKey(k)) {
                    continue;
                }
                for (int m = 0; m < modes.size(); m++) {
                    if (!taken[m] && score[k.ordinal()][m] > best) {
                        best = score[k.ordinal()][m];
                        bestK = k.ordinal();
                        bestM = m;
                    }
                }
            }
            if (bestM < 0) {
                throw new IllegalArgumentException("too few modes to tell the twisting and bending modes apart");
            }
            taken[bestM] = true;
            out.put(Kind.values()[bestK], new double[] {modes.get(bestM).frequencyHz(), best});
        }
        return out;
    }

    /** |normalised correlation| of a mode's grid with a kind's ideal shape. */
    static double shapeMatch(ModeShape s, double[] bounds, Kind kind) {
        double sw = 0;
        double ww = 0;
        double rr = 0;
        for (int i = 0; i < s.xs().length; i++) {
            double xi = 2 * (s.xs()[i] - bounds[0]) / (bounds[2] - bounds[0]) - 1;
            for (int j = 0; j < s.ys().length; j++) {
                double w = s.w()[i][j];
                if (!Double.isFinite(w)) {
                    continue;
                }
                double eta = 2 * (s.ys()[j] - bounds[1]) / (bounds[3] - bounds[1]) - 1;
                double r = switch (kind) {
                    case TWISTING -> xi * eta;
                    case ALONG -> 3 * xi * xi - 1;
                    case ACROSS -> 3 * eta * eta - 1;
                };
                sw += w * r;
                ww += w * w;
                rr += r * r;
            }
        }
        return ww == 0 || rr == 0 ? 0 : Math.abs(sw) / Math.sqrt(ww * rr);
    }

    /**
     * Which of the measured peaks is which mode, before any fit: the three modes' frequencies computed with the
     * start material are matched to three different peaks, minimising the sum of squared log ratios (each kind
     * within a factor {@code 2} of its prediction). Returns the peak index per kind (missing when none is near).
     */
    public Map<Kind, Integer> assignPeaks(double lengthM, double widthM, double thicknessM, PlateMaterial start,
            double[] peaksHz) {
        Outline outline = Outline.rectangle(lengthM, widthM);
        Map<Kind, double[]> predicted = identify(solver.analyze(new Plate(outline, start,
                ThicknessField.uniform(thicknessM), EdgeCondition.FREE, List.of()), MODES), outline);
        Kind[] kinds = Kind.values();
        int n = peaksHz.length;
        double best = Double.POSITIVE_INFINITY;
        int[] choice = null;
        int[] pick = new int[3];
        for (pick[0] = -1; pick[0] < n; pick[0]++) {
            for (pick[1] = -1; pick[1] < n; pick[1]++) {
                for (pick[2] = -1; pick[2] < n; pick[2]++) {
                    double cost = 0;
                    boolean ok = true;
                    for (int k = 0; k < 3 && ok; k++) {
                        if (pick[k] < 0) {
                            cost += 1.0; // a mode left unmatched costs as much as one off by a factor e
                            continue;
                        }
                        for (int l = 0; l < k; l++) {
                            ok &= pick[l] != pick[k];
                        }
                        double lr = Math.log(peaksHz[pick[k]] / predicted.get(kinds[k])[0]);
                        ok &= Math.abs(lr) <= Math.log(2);
                        cost += lr * lr;
                    }
                    if (ok && cost < best) {
                        best = cost;
                        choice = pick.clone();
                    }
                }
            }
        }
        Map<Kind, Integer> out = new EnumMap<>(Kind.class);
        if (choice != null) {
            for (int k = 0; k < 3; k++) {
                if (choice[k] >= 0) {
                    out.put(kinds[k], choice[k]);
                }
            }
        }
        return out;
    }
}
