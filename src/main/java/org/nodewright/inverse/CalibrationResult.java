package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.CalibrationParameter;
import org.nodewright.physics.inverse.Calibrator;

/**
 * A finished calibration: each parameter's start and fitted value, each measured fingering's model
 * pitch before and after with its cents from the measurement, the residuals' rms, and the bore with
 * the fitted values (to re-solve the holes with, or to open in the bore bench).
 */
record CalibrationResult(List<Value> parameters, List<Note> notes, double rmsCentsBefore, double rmsCentsAfter,
        double worstCentsAfter, int evaluations, List<ImpedancePeak> impedancePeaks, AirColumnRequest bore) {

    /**
     * A resonance of the measured impedance: its number from the lowest, frequency and prominence,
     * whether the fit used it (its note is then "impedance peak n"), and why not.
     */
    record ImpedancePeak(int n, double measuredHz, double prominenceDb, boolean used, String reason) {
    }

    record Value(CalibrationParameter parameter, String field, String unit, double startValue, double fittedValue,
            double lower, double upper) {
    }

    record Note(String fingering, double measuredHz, double modelBeforeHz, double centsBefore, double modelAfterHz,
            double centsAfter) {
    }

    static CalibrationResult of(Calibrator.Fit fit, List<CalibrationSetup.Parameter> ps, List<Fingering> measured,
            AirColumnRequest bore, List<CalibrationSetup.Peak> peaks) {
        List<Value> values = new ArrayList<>();
        for (int i = 0; i < ps.size(); i++) {
            CalibrationSetup.Parameter p = ps.get(i);
            values.add(new Value(p.kind(), p.field(), p.unit(), p.start(), fit.fitted()[i], p.lower(), p.upper()));
        }
        List<Note> notes = new ArrayList<>();
        double worst = 0;
        for (int i = 0; i < measured.size(); i++) {
            notes.add(new Note(measured.get(i).name(), measured.get(i).targetHz(), fit.modelBeforeHz()[i],
                    fit.before()[i], fit.modelAfterHz()[i], fit.after()[i]));
            worst = Math.max(worst, Math.abs(fit.after()[i]));
        }
        return new CalibrationResult(values, notes, fit.rmsBefore(), fit.rmsAfter(), worst, fit.evaluations(),
                peaks.stream().map(p -> new ImpedancePeak(p.n(), p.measuredHz(), p.prominenceDb(), p.used(), p.note()))
                        .toList(),
                CalibrationSetup.with(bore, ps, fit.fitted()));
    }
}
