package org.nodewright.measurements;

import java.util.List;
import org.nodewright.physics.measure.ImpedanceCurve;
import org.nodewright.physics.measure.ImpedancePeak;

/**
 * Answer of the impedance import: the curve as read (phase in radians, the air-column analysis'
 * shape) and its maxima and minima; {@code resonances} are the maxima for a closed input end and
 * the minima for an open one.
 */
record ImpedanceResponse(Curve impedance, List<Extremum> maxima, List<Extremum> minima, String inputEnd,
        List<Extremum> resonances) {

    record Curve(double[] frequencyHz, double[] magnitude, double[] phaseRad) {
    }

    record Extremum(int n, double frequencyHz, double magnitude, double prominenceDb, Double q) {
    }

    static ImpedanceResponse of(ImpedanceCurve curve, List<ImpedancePeak> maxima, List<ImpedancePeak> minima,
            boolean openInput) {
        List<Extremum> max = numbered(maxima);
        List<Extremum> min = numbered(minima);
        return new ImpedanceResponse(new Curve(curve.frequencyHz(), curve.magnitude(), curve.phaseRad()), max, min,
                openInput ? "open" : "closed", openInput ? min : max);
    }

    private static List<Extremum> numbered(List<ImpedancePeak> peaks) {
        return java.util.stream.IntStream.range(0, peaks.size())
                .mapToObj(i -> {
                    ImpedancePeak p = peaks.get(i);
                    return new Extremum(i + 1, p.frequencyHz(), p.magnitude(), p.prominenceDb(),
                            Double.isFinite(p.q()) ? p.q() : null);
                })
                .toList();
    }
}
