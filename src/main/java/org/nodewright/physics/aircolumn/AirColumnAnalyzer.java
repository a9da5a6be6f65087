package org.nodewright.physics.aircolumn;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.tuning.Cents;
import org.nodewright.physics.tuning.EqualTemperament;

/**
 * Runs the whole analysis of one bore: impedance sweep, resonances, profiles, register alignment
 * and fingerings.
 */
public final class AirColumnAnalyzer {

    /** At most this many resonances are reported. */
    public static final int MAX_RESONANCES = 120;
    /** Grid cells per lowest-mode spacing c / (2 L) used to detect resonances (at least). */
    static final int CELLS_PER_SPACING = 24;
    private static final int MAX_DETECTION_POINTS = 60_000;

    private final EqualTemperament temperament;
    private final int profileSamples;

    /**
     * @param referenceA4    A4 in hertz for note names (&gt; 0)
     * @param profileSamples samples per standing-wave profile (2..2001)
     */
    public AirColumnAnalyzer(double referenceA4, int profileSamples) {
        if (!(referenceA4 > 0) || profileSamples < 2 || profileSamples > 2001) {
            throw new IllegalArgumentException("need A4 > 0 and 2..2001 profile samples: " + referenceA4 + ", "
                    + profileSamples);
        }
        this.temperament = new EqualTemperament(referenceA4);
        this.profileSamples = profileSamples;
    }

    /**
     * Analyses the bore on the uniform grid fMin..fMax with the given number of points.
     *
     * @throws IllegalArgumentException for 0 &lt; fMin &lt; fMax violated or points &lt; 2
     */
    public AirColumnAnalysis analyze(AirColumn column, double fMin, double fMax, int points, List<Fingering> fingerings) {
        if (!(fMin > 0) || !(fMax > fMin) || points < 2) {
            throw new IllegalArgumentException("need 0 < fMin < fMax and points >= 2: " + fMin + ", " + fMax + ", "
                    + points);
        }
        List<AirColumnWarning> warnings = new ArrayList<>();
        TransferMatrixSolver solver = new TransferMatrixSolver(column);
        double df = (fMax - fMin) / (points - 1);
        double[] re = new double[points];
        double[] im = new double[points];
        solver.inputImpedance(fMin, df, points, re, im);
        double[] mag = new double[points];
        double[] phase = new double[points];
        for (int i = 0; i < points; i++) {
            mag[i] = Math.hypot(re[i], im[i]);
            phase[i] = Math.atan2(im[i], re[i]);
        }
        List<Resonance> found = resonances(solver, fMin, fMax, df, re, im);
        if (found.size() >= MAX_RESONANCES) {
            warnings.add(new AirColumnWarning.ResonanceCap(MAX_RESONANCES));
        }
        HarmonicSeries series = HarmonicSeries.of(column);
        List<AirColumnAnalysis.ResonanceResult> results = new ArrayList<>();
        double f1 = found.isEmpty() ? Double.NaN : found.get(0).frequencyHz();
        for (Resonance r : found) {
            int m = series.member(r.n());
            double ratio = r.frequencyHz() / f1;
            double cents = Cents.between(r.frequencyHz(), m * f1);
            results.add(new AirColumnAnalysis.ResonanceResult(r, temperament.nearest(r.frequencyHz()),
                    StandingWaveProfile.compute(solver, r.frequencyHz(), profileSamples), ratio, m, cents));
        }
        List<AirColumnAnalysis.FingeringResult> fr = new ArrayList<>();
        for (Fingering f : fingerings) {
            fr.add(predict(column, f, fMin, fMax, warnings));
        }
        addRangeWarnings(column, fMax, warnings);
        MouthEffect mouth = null;
        if (column.mouth() != null) {
            TransferMatrixSolver bare = new TransferMatrixSolver(column.withMouth(null));
            mouth = MouthEffect.of(column, solver, found, detect(bare, fMin, fMax, MAX_RESONANCES), fMin, fMax);
        }
        return new AirColumnAnalysis(column.air(), grid(fMin, df, points), mag, phase, results, series, fr,
                warnings, mouth, airAlongBore(column), column.meanSpeedOfSound());
    }

    /** Points along the bore at which the breath's air is reported. */
    static final int AIR_POINTS = 11;

    private static List<AirColumnAnalysis.AirPoint> airAlongBore(AirColumn column) {
        if (column.breath() == null) {
            return List.of();
        }
        List<AirColumnAnalysis.AirPoint> out = new ArrayList<>();
        for (int i = 0; i < AIR_POINTS; i++) {
            double u = (double) i / (AIR_POINTS - 1);
            out.add(new AirColumnAnalysis.AirPoint(u * column.length(), column.breath().co2MoleFraction(),
                    column.breath().airAt(u)));
        }
        return out;
    }

    /** At most limit resonances on the detection grid alone (no user grid). */
    static List<Resonance> detect(TransferMatrixSolver solver, double fMin, double fMax, int limit) {
        double cell = maxDetectionCell(solver.column());
        int n = (int) Math.min(MAX_DETECTION_POINTS, Math.max(64, Math.ceil((fMax - fMin) / cell) + 1));
        double d = (fMax - fMin) / (n - 1);
        double[] re = new double[n];
        double[] im = new double[n];
        solver.inputImpedance(fMin, d, n, re, im);
        return new ResonanceFinder(solver).find(fMin, d, re, im, limit);
    }

    private static double[] grid(double f0, double df, int n) {
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = f0 + i * df;
        }
        return f;
    }

    /** Resonances on the user's grid when it is fine enough, otherwise on a denser internal grid. */
    private static List<Resonance> resonances(TransferMatrixSolver solver, double fMin, double fMax, double df,
            double[] re, double[] im) {
        ResonanceFinder finder = new ResonanceFinder(solver);
        double maxCell = maxDetectionCell(solver.column());
        if (df <= maxCell) {
            return finder.find(fMin, df, re, im, MAX_RESONANCES);
        }
        int n = (int) Math.min(MAX_DETECTION_POINTS, Math.ceil((fMax - fMin) / maxCell) + 1);
        double d = (fMax - fMin) / (n - 1);
        double[] r2 = new double[n];
        double[] i2 = new double[n];
        solver.inputImpedance(fMin, d, n, r2, i2);
        return finder.find(fMin, d, r2, i2, MAX_RESONANCES);
    }

    private static double maxDetectionCell(AirColumn column) {
        return column.meanSpeedOfSound() / (2 * column.length()) / CELLS_PER_SPACING;
    }

    private AirColumnAnalysis.FingeringResult predict(AirColumn column, Fingering f, double fMin, double fMax,
            List<AirColumnWarning> warnings) {
        List<ToneHole> holes = new ArrayList<>();
        for (int i = 0; i < column.holes().size(); i++) {
            holes.add(column.holes().get(i).withOpen(!f.closedHoles().contains(i)));
        }
        TransferMatrixSolver solver = new TransferMatrixSolver(column.withHoles(holes));
        double cell = maxDetectionCell(column);
        int n = (int) Math.min(MAX_DETECTION_POINTS, Math.max(64, Math.ceil((fMax - fMin) / cell) + 1));
        double d = (fMax - fMin) / (n - 1);
        double[] re = new double[n];
        double[] im = new double[n];
        solver.inputImpedance(fMin, d, n, re, im);
        List<Resonance> rs = new ResonanceFinder(solver).find(fMin, d, re, im, f.register());
        if (rs.size() < f.register()) {
            warnings.add(new AirColumnWarning.RegisterNotFound(f.name(), f.register(), fMin, fMax));
            return new AirColumnAnalysis.FingeringResult(f, Double.NaN, Double.NaN, null, Double.NaN);
        }
        Resonance r = rs.get(f.register() - 1);
        return new AirColumnAnalysis.FingeringResult(f, r.frequencyHz(), Cents.between(r.frequencyHz(), f.targetHz()),
                temperament.nearest(r.frequencyHz()), r.q());
    }

    private static void addRangeWarnings(AirColumn column, double fMax, List<AirColumnWarning> warnings) {
        double rMax = 0;
        for (BoreSegment s : column.segments()) {
            rMax = Math.max(rMax, Math.max(s.inputRadius(), s.outputRadius()));
        }
        double ka = 2 * Math.PI * fMax / column.referenceAir().speedOfSound() * rMax;
        if (ka > 1.84) {
            warnings.add(new AirColumnWarning.CrossModes(ka));
        }
        double t = column.air().temperatureC();
        if (t < 0 || t > 30) {
            warnings.add(new AirColumnWarning.OutsideSpeedFit(t));
        }
    }
}
