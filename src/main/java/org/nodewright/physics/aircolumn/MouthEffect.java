package org.nodewright.physics.aircolumn;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.tuning.Cents;

/**
 * What the mouth does to a bore: its equivalent length (the bare cylinder of the first segment's
 * input radius that, added at the input of the bare bore, puts the lowest resonance where the
 * mouth puts it), each resonance's shift in cents against the same bore with a bare input end,
 * and the figures makers compare: the cup's Helmholtz ("popping") frequency, and for a reed on a
 * cone the volume of the cone's missing apex.
 *
 * @param endCorrection       equivalent length, m (NaN when no resonance was found)
 * @param resonanceCents      per resonance of the analysis: cents from the bare bore's nearest one
 * @param bareFrequencies     that bare resonance, Hz, per resonance (NaN when the bare bore has none)
 * @param helmholtzHz         cup mouths: the cup and throat's Helmholtz frequency (else NaN)
 * @param missingApexVolume   reed mouths on a diverging first segment: pi r1^2 x1 / 3, m^3 (else NaN)
 */
public record MouthEffect(Mouth mouth, double endCorrection, List<Double> resonanceCents, List<Double> bareFrequencies,
        double helmholtzHz, double missingApexVolume) {

    private static final int MAX_ITERATIONS = 30;

    public MouthEffect {
        resonanceCents = List.copyOf(resonanceCents);
        bareFrequencies = List.copyOf(bareFrequencies);
    }

    /**
     * The effect of column's mouth given the resonances found with it; bare are the resonances of
     * column.withMouth(null) over the same range.
     */
    static MouthEffect of(AirColumn column, TransferMatrixSolver solver, List<Resonance> withMouth,
            List<Resonance> bare, double fMin, double fMax) {
        List<Double> cents = new ArrayList<>();
        List<Double> bareHz = new ArrayList<>();
        for (int i = 0; i < withMouth.size(); i++) {
            // In order from the lowest: the mouth moves each resonance, it does not reorder them.
            double b = i < bare.size() ? bare.get(i).frequencyHz() : Double.NaN;
            bareHz.add(b);
            cents.add(Double.isNaN(b) ? Double.NaN : Cents.between(withMouth.get(i).frequencyHz(), b));
        }
        double dl = Double.NaN;
        if (!withMouth.isEmpty() && !bare.isEmpty()) {
            dl = equivalentLength(column.withMouth(null), withMouth.get(0).frequencyHz(), bare.get(0).frequencyHz());
        }
        double apex = Double.NaN;
        BoreSegment first = column.segments().get(0);
        if (column.mouth() instanceof Mouth.Reed && first.outputRadius() > first.inputRadius()) {
            double x1 = first.inputRadius() * first.length() / (first.outputRadius() - first.inputRadius());
            apex = Math.PI * first.inputRadius() * first.inputRadius() * x1 / 3;
        }
        return new MouthEffect(column.mouth(), dl, cents, bareHz, solver.mouthHelmholtzHz(), apex);
    }

    /**
     * The length dl of cylinder (radius of the first segment's input) to add at the input of the
     * bare bore (holes moving with the bore) so that its lowest resonance, followed from fBare,
     * falls on target; a negative dl shortens the first segment. Secant steps on dl, started from
     * the plane-wave estimate dl = L_e (fBare / target - 1) with L_e = c / (2 fBare) for a bore
     * that plays like an open pipe (c / 4 fBare when like a stopped one).
     */
    static double equivalentLength(AirColumn bare, double target, double fBare) {
        double c = bare.meanSpeedOfSound();
        boolean stopped = (bare.inputEnd() == InputEnd.CLOSED) != (bare.outputEnd() == OutputEnd.CLOSED);
        double le = c / ((stopped ? 4 : 2) * fBare);
        double x0 = 0;
        double g0 = Math.log(fBare / target);
        double x1 = le * (fBare / target - 1);
        double f1 = nearest(lengthened(bare, x1), target);
        double g1 = Math.log(f1 / target);
        for (int i = 0; i < MAX_ITERATIONS && Math.abs(g1) > 1e-9 && g1 != g0; i++) {
            double x2 = x1 - g1 * (x1 - x0) / (g1 - g0);
            double limit = -0.9 * bare.segments().get(0).length();
            x2 = Math.max(x2, limit);
            x0 = x1;
            g0 = g1;
            x1 = x2;
            f1 = nearest(lengthened(bare, x1), target);
            g1 = Math.log(f1 / target);
        }
        return Double.isFinite(g1) && Math.abs(g1) < 1e-6 ? x1 : Double.NaN;
    }

    /** bare with dl of cylinder added at its input (dl &lt; 0: the first segment shortened). */
    static AirColumn lengthened(AirColumn bare, double dl) {
        List<BoreSegment> segs = new ArrayList<>(bare.segments());
        BoreSegment first = segs.get(0);
        if (dl > 0) {
            segs.add(0, new BoreSegment(dl, first.inputRadius(), first.inputRadius()));
        } else if (dl < 0) {
            double r = first.radiusAt(-dl);
            segs.set(0, new BoreSegment(first.length() + dl, r, first.outputRadius()));
        } else {
            return bare;
        }
        List<ToneHole> holes = new ArrayList<>();
        for (ToneHole h : bare.holes()) {
            double at = h.position() + dl;
            if (at > 0) {
                holes.add(new ToneHole(at, h.radius(), h.chimney(), h.open()));
            }
        }
        return new AirColumn(segs, holes, bare.inputEnd(), bare.outputEnd(), bare.air(), bare.losses(), null,
                bare.breath());
    }

    /**
     * The playing resonance of column nearest target (NaN when there is none within a factor 1.6):
     * the analyzer's detection grid and {@link ResonanceFinder} over target / 1.6 .. 1.6 target.
     */
    static double nearest(AirColumn column, double target) {
        TransferMatrixSolver s = new TransferMatrixSolver(column);
        double best = Double.NaN;
        for (Resonance r : AirColumnAnalyzer.detect(s, target / 1.6, target * 1.6, AirColumnAnalyzer.MAX_RESONANCES)) {
            if (Double.isNaN(best) || Math.abs(Math.log(r.frequencyHz() / target)) < Math.abs(Math.log(best / target))) {
                best = r.frequencyHz();
            }
        }
        return best;
    }
}
