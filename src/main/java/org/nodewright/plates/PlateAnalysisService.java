package org.nodewright.plates;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.plates.ModeShape;
import org.nodewright.physics.plates.Plate;
import org.nodewright.physics.plates.PlateAnalysis;
import org.nodewright.physics.plates.PlateMode;
import org.nodewright.physics.plates.PlateSolver;
import org.springframework.stereotype.Service;

/** Runs the plate solver for a validated request and writes its answer in the contract's units. */
@Service
public class PlateAnalysisService {

    /** Kirchhoff theory holds for thin plates; beyond this thickness-to-span ratio the answer is flagged. */
    static final double THIN_PLATE_RATIO = 0.1;

    public PlateAnalysisResponse analyze(PlateAnalysisRequest request) {
        Plate plate = PlateMapping.toPlate(request);
        PlateAnalysis analysis = new PlateSolver().analyze(plate, request.modeCountOrDefault());
        List<PlateAnalysisResponse.Mode> modes = analysis.modes().stream().map(PlateAnalysisService::mode).toList();
        List<String> cautions = new ArrayList<>();
        double[] b = plate.outline().bounds();
        double span = Math.min(b[2] - b[0], b[3] - b[1]);
        double thickest = request.thicknessPoints() == null || request.thicknessPoints().isEmpty()
                ? request.thicknessMm() * 1e-3
                : request.thicknessPoints().stream().mapToDouble(p -> p.thicknessMm() * 1e-3).max().orElse(0);
        if (thickest > THIN_PLATE_RATIO * span) {
            cautions.add("The plate is thick for its size (thickness above a tenth of the shorter span): thin-plate"
                    + " (Kirchhoff) theory overestimates its frequencies, more so for the higher modes.");
        }
        return new PlateAnalysisResponse(modes, analysis.method(), analysis.basisSize(), cautions);
    }

    private static PlateAnalysisResponse.Mode mode(PlateMode m) {
        ModeShape s = m.shape();
        double[] xMm = mm(s.xs());
        double[] yMm = mm(s.ys());
        List<List<Double>> w = new ArrayList<>(s.w().length);
        for (double[] row : s.w()) {
            List<Double> out = new ArrayList<>(row.length);
            for (double v : row) {
                out.add(Double.isFinite(v) ? round(v, 1e6) : null);
            }
            w.add(out);
        }
        List<List<double[]>> lines = s.nodalLines().stream()
                .map(line -> java.util.Arrays.stream(line).map(p -> new double[] {round(p[0] * 1e3, 1e4),
                        round(p[1] * 1e3, 1e4)}).toList())
                .toList();
        PlateAnalysisResponse.NoteJson note = m.note() == null ? null
                : new PlateAnalysisResponse.NoteJson(m.note().name(), m.note().centsOff());
        return new PlateAnalysisResponse.Mode(m.n(), m.frequencyHz(), note, m.name(), m.nodalLinesX(),
                m.nodalLinesY(), new PlateAnalysisResponse.Grid(xMm, yMm, w), lines);
    }

    private static double[] mm(double[] metres) {
        double[] out = new double[metres.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = round(metres[i] * 1e3, 1e6);
        }
        return out;
    }

    /** Rounds to a fixed grid (shapes to 1e-6 of their maximum, positions to 1e-4 mm): no rounding noise in the answer. */
    private static double round(double v, double steps) {
        return Math.round(v * steps) / steps;
    }
}
