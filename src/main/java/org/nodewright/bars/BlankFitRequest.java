package org.nodewright.bars;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.bars.BeamTheory;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Body of {@code POST /api/v1/bars/measure-blank}: the blank as the bench sends it (its material or
 * moduli are the fit's start and give the density) and the bending modes heard when it was tapped.
 * {@code fitShear} (default true) also fits G when two or more modes are given and they feel it.
 */
@CrossFieldChecked
public record BlankFitRequest(
        @NotNull @Valid BarAnalysisRequest bar,
        @NotNull @Size(min = 1, max = BarAnalyzer.MAX_MODES) List<@NotNull @Valid Heard> modes,
        Boolean fitShear) implements CrossFieldChecked.Rules {

    /** One bending mode heard: its number (1 = lowest) and frequency. */
    public record Heard(
            @NotNull @Min(1) @Max(BarAnalyzer.MAX_MODES) Integer n,
            @NotNull @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
            @DecimalMax(value = "100000", message = "must be at most 100000 Hz") Double frequencyHz) {
    }

    public boolean fitShearOn() {
        return fitShear == null || fitShear;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (modes == null) {
            return out;
        }
        for (int i = 0; i < modes.size(); i++) {
            Heard h = modes.get(i);
            if (h == null || h.n() == null || h.frequencyHz() == null || !Double.isFinite(h.frequencyHz())) {
                continue;
            }
            for (int j = 0; j < i; j++) {
                Heard o = modes.get(j);
                if (o == null || o.n() == null || o.frequencyHz() == null) {
                    continue;
                }
                if (o.n().equals(h.n())) {
                    out.add(new FieldProblem("modes[" + i + "].n", "mode " + h.n() + " is given twice (also modes["
                            + j + "])"));
                } else if ((o.n() < h.n()) != (o.frequencyHz() < h.frequencyHz())) {
                    out.add(new FieldProblem("modes[" + i + "].frequencyHz", "must put the modes in the order of their "
                            + "numbers: mode " + h.n() + " at " + h.frequencyHz() + " Hz and mode " + o.n() + " at "
                            + o.frequencyHz() + " Hz"));
                }
            }
        }
        return out;
    }

    BeamTheory theory() {
        return bar == null ? BeamTheory.TIMOSHENKO : bar.theoryOrDefault();
    }
}
