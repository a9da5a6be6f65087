package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.inverse.CalibrationParameter;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Calibrate from what was played: the bore as built (holes and fingerings, mouth), the pitch
 * measured for some of its fingerings (by fingering name) and/or a measured input-impedance curve,
 * and what to fit (default: the mouth's figure when there is a mouth, else the air temperature).
 */
@CrossFieldChecked
record CalibrationRequest(
        @NotNull @Valid AirColumnRequest bore,
        @Size(min = 1, max = AirColumnRequest.MAX_FINGERINGS) List<@NotNull @Valid Measured> measured,
        @Size(min = 1, max = 2) List<@NotNull CalibrationParameter> fit,
        @Valid MeasuredImpedance impedance) implements CrossFieldChecked.Rules {

    /** A CSV of at most this many characters (a fine sweep of 100 000 rows fits). */
    static final int MAX_CSV_CHARS = 5_000_000;
    static final int DEFAULT_MAX_PEAKS = 6;
    static final double DEFAULT_PROMINENCE_DB = 3.0;

    /**
     * A measured input-impedance curve, as the bore bench's measured-impedance panel reads it: the
     * CSV text (frequencyHz, magnitude, phase; radians unless {@code phaseUnit} or the header says
     * degrees), the fingering it was measured with (by name; absent: the holes open or closed as
     * bore.holes say), the prominence a resonance must have, and how many of the lowest to use.
     */
    record MeasuredImpedance(
            @Size(min = 1, max = 80) String fingering,
            @NotNull @Size(min = 1, max = MAX_CSV_CHARS) String csv,
            String phaseUnit,
            @Finite @DecimalMin("0") @DecimalMax("60") Double minProminenceDb,
            @Min(1) @Max(20) Integer maxPeaks) {

        double prominenceOrDefault() {
            return minProminenceDb == null ? DEFAULT_PROMINENCE_DB : minProminenceDb;
        }

        int maxPeaksOrDefault() {
            return maxPeaks == null ? DEFAULT_MAX_PEAKS : maxPeaks;
        }
    }

    List<Measured> measuredOrEmpty() {
        return measured == null ? List.of() : measured;
    }

    /** One measured pitch: the fingering's name as in bore.fingerings, and the pitch heard. */
    record Measured(@NotNull @Size(min = 1, max = 80) String fingering,
            @NotNull @Finite @Positive @DecimalMax("20000") Double measuredHz) {
    }

    List<CalibrationParameter> fitOrDefault() {
        if (fit != null) {
            return fit;
        }
        return List.of(bore.mouth() != null ? CalibrationParameter.MOUTH : CalibrationParameter.AIR_TEMPERATURE);
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (bore == null) {
            return out;
        }
        Set<String> names = new HashSet<>();
        bore.fingeringsOrEmpty().forEach(f -> {
            if (f != null && f.name() != null) {
                names.add(f.name());
            }
        });
        if (measured != null) {
            Set<String> seen = new HashSet<>();
            for (int i = 0; i < measured.size(); i++) {
                Measured m = measured.get(i);
                if (m == null || m.fingering() == null) {
                    continue;
                }
                if (!names.contains(m.fingering())) {
                    out.add(new FieldProblem("measured[" + i + "].fingering", "no fingering named '" + m.fingering()
                            + "' in bore.fingerings"));
                } else if (!seen.add(m.fingering())) {
                    out.add(new FieldProblem("measured[" + i + "].fingering", "measured twice: give one pitch per fingering"));
                }
            }
        }
        if (measured == null && impedance == null) {
            out.add(new FieldProblem("measured", "give the measured pitches, or a measured impedance"));
        }
        if (impedance != null) {
            CalibrationSetup.impedanceProblems(out, this, names);
        }
        if (fit != null) {
            if (fit.contains(CalibrationParameter.MOUTH) && bore.mouth() == null) {
                out.add(new FieldProblem("fit", "the bore has no mouth to fit; add one or fit air-temperature"));
            }
            if (new HashSet<>(fit).size() != fit.size()) {
                out.add(new FieldProblem("fit", "name each parameter once"));
            }
        }
        return out;
    }
}
