package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.plates.ThicknessTuner;
import org.nodewright.plates.PlateAnalysisRequest;

/**
 * A finished plate thickness solve as the API shows it (mm): each target's cents, the value found for each unknown
 * (and how much to remove from the plate as it was), the sensitivities a maker uses while thinning (Hz each target
 * mode moves when 0.1 mm is removed from each unknown, and from the whole plate at once), and the plate request with
 * the solved thicknesses for the bench to apply and the graduation template to draw.
 */
record PlateThicknessResult(List<Target> targets, boolean converged, int evaluations, double worstCents,
        List<UnknownValue> unknowns, List<Sensitivity> sensitivities, PlateAnalysisRequest plate) {

    /** A target: the mode as asked (its rank on the plate as it was), its rank on the solved plate, Hz, cents. */
    record Target(int mode, int modeNow, double targetHz, double frequencyHz, double cents) {
    }

    /** One unknown: its kind and index (from 0), its value before and after, and the wood to remove (mm). */
    record UnknownValue(ThicknessTuner.Kind kind, int index, double startMm, double valueMm, double removeMm) {
    }

    /** For one target mode: Hz per 0.1 mm removed from each unknown (in the order of {@code unknowns}) and the whole plate. */
    record Sensitivity(int mode, List<Double> hzPerTenthMmRemoved, double wholePlateHzPerTenthMmRemoved) {
    }

    static PlateThicknessResult of(ThicknessTuner.Solution s, List<ThicknessTuner.Target> targets,
            List<ThicknessTuner.Unknown> unknowns, double[] startM, PlateAnalysisRequest original) {
        List<Target> t = new ArrayList<>();
        for (int i = 0; i < targets.size(); i++) {
            t.add(new Target(targets.get(i).mode(), s.modesNow()[i], targets.get(i).targetHz(), s.frequencies()[i],
                    s.cents()[i]));
        }
        List<UnknownValue> u = new ArrayList<>();
        for (int k = 0; k < unknowns.size(); k++) {
            double start = round(startM[k] / MM);
            double value = round(s.values()[k] / MM);
            u.add(new UnknownValue(unknowns.get(k).kind(), unknowns.get(k).index(), start, value, round(start - value)));
        }
        List<Sensitivity> sens = new ArrayList<>();
        for (int i = 0; i < targets.size(); i++) {
            double[] row = s.hzPerTenthMm()[i];
            List<Double> per = new ArrayList<>();
            for (int k = 0; k < unknowns.size(); k++) {
                per.add(row[k]);
            }
            sens.add(new Sensitivity(targets.get(i).mode(), per, row[unknowns.size()]));
        }
        return new PlateThicknessResult(t, s.converged(), s.evaluations(), s.worstCents(), u, sens,
                solvedRequest(original, unknowns, s.values()));
    }

    /** The bench's request with the solved values in mm (to 0.001 mm: far below a scraper's shaving). */
    static PlateAnalysisRequest solvedRequest(PlateAnalysisRequest r, List<ThicknessTuner.Unknown> unknowns,
            double[] values) {
        Double thickness = r.thicknessMm();
        List<PlateAnalysisRequest.ThicknessPoint> points = r.thicknessPoints() == null ? null
                : new ArrayList<>(r.thicknessPoints());
        List<PlateAnalysisRequest.BraceJson> braces = r.braces() == null ? null : new ArrayList<>(r.braces());
        for (int k = 0; k < unknowns.size(); k++) {
            ThicknessTuner.Unknown u = unknowns.get(k);
            double mm = round(values[k] / MM);
            switch (u.kind()) {
                case THICKNESS -> thickness = mm;
                case THICKNESS_POINT -> {
                    PlateAnalysisRequest.ThicknessPoint p = points.get(u.index());
                    points.set(u.index(), new PlateAnalysisRequest.ThicknessPoint(p.xMm(), p.yMm(), mm));
                }
                case BRACE_HEIGHT -> {
                    PlateAnalysisRequest.BraceJson b = braces.get(u.index());
                    braces.set(u.index(), new PlateAnalysisRequest.BraceJson(b.fromMm(), b.toMm(), b.widthMm(), mm));
                }
                default -> throw new IllegalStateException();
            }
        }
        return r.withThicknessAndBraces(thickness, points, braces);
    }

    private static double round(double mm) {
        return Math.round(mm * 1000) / 1000.0;
    }
}
