package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.bars.BarMode;
import org.nodewright.physics.bars.BeamTheory;
import org.nodewright.physics.bars.GrindingSensitivity;
import org.nodewright.physics.bars.RectangleSection;
import org.nodewright.physics.bars.ThicknessProfile;
import org.nodewright.physics.bars.TuningTargets;
import org.nodewright.physics.bars.UndercutSolution;

/**
 * A finished bar tuning solve as the API shows it (mm): the cut, each target's cents, the cord
 * holes at the nodes of mode 1, the grinding chart, and the bar request with the cut profile for
 * the bench to apply.
 */
record BarTuningResult(double lengthMm, Undercut undercut, List<Target> targets, boolean converged,
        int evaluations, double worstCents, List<Double> cordHolesMm, Sensitivity sensitivity, BarAnalysisRequest bar) {

    record Undercut(double depthMm, double halfLengthMm, double shape, double minimumThicknessMm) {
    }

    record Target(int n, double targetHz, double frequencyHz, double cents) {
    }

    /** cents per mm² removed at each position, for modes 1..3 (grinding order chart). */
    record Sensitivity(List<Double> positionsMm, List<List<Double>> centsPerMm2) {
    }

    static BarTuningResult of(UndercutSolution s, TuningTargets targets, BeamTheory theory, BarAnalysisRequest original) {
        List<Target> t = new ArrayList<>();
        for (int n = 1; n <= targets.modes(); n++) {
            t.add(new Target(n, targets.targetHz(n), s.frequencies()[n - 1], s.cents()[n - 1]));
        }
        ThicknessProfile p = ((RectangleSection) s.bar().section()).profile();
        List<BarAnalysisRequest.ProfilePoint> points = new ArrayList<>();
        for (int i = 0; i < p.size(); i++) {
            points.add(new BarAnalysisRequest.ProfilePoint(round(p.position(i) / MM), round(p.thickness(i) / MM)));
        }
        double length = s.bar().length() / MM;
        BarAnalysisRequest cut = new BarAnalysisRequest(length, original.section(), original.widthMm(), null, null, null,
                points, original.material(), original.densityKgPerM3(), original.youngsModulusPa(),
                original.shearModulusPa(), original.ends(), original.theory(), original.modeCount(),
                original.referenceA4Hz(), original.otherFamilies());
        BarMode first = BarAnalyzer.analyze(s.bar(), theory, 1, false).bending().get(0);
        GrindingSensitivity g = GrindingSensitivity.of(s.bar(), theory, Math.min(3, Math.max(1, targets.modes())));
        List<Double> xs = new ArrayList<>();
        for (double x : g.positions()) {
            xs.add(round(x / MM));
        }
        List<List<Double>> cents = new ArrayList<>();
        for (double[] row : g.centsPerMm2()) {
            List<Double> r = new ArrayList<>();
            for (double v : row) {
                r.add(v);
            }
            cents.add(r);
        }
        double t0 = p.maximumThickness();
        return new BarTuningResult(length, new Undercut(s.shape().depth() / MM, s.shape().halfLength() / MM,
                s.shape().shape(), s.shape().minimumThickness(t0) / MM), t, s.converged(), s.evaluations(),
                s.worstCents(), first.nodes().stream().map(x -> x / MM).toList(), new Sensitivity(xs, cents), cut);
    }

    /** Positions and thicknesses to 0.001 mm (a micrometre: beyond any grinder). */
    private static double round(double mm) {
        return Math.round(mm * 1000) / 1000.0;
    }
}
