package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nodewright.inverse.DemoWhistle;
import org.nodewright.physics.tuning.Cents;

class ToneHoleSolverTest {

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void theWorkshopWhistleEndsWithinItsToleranceOfEveryNoteByTheCoresOwnModel(boolean varyDiameters) {
        var model = DemoWhistle.model();
        var solution = new ToneHoleSolver(0.1, 400).solve(model, DemoWhistle.start(), model.lengthBeforeFootMm(),
                DemoWhistle.fingerings(), DemoWhistle.limits(varyDiameters), SolveProgress.NONE, () -> false);
        // Asked for 0.1 cent and reported within it: every note must be within 0.1 cent (a 3-cent
        // window would pass a solver that stopped long before its tolerance).
        assertThat(solution.withinTolerance()).isTrue();
        assertThat(solution.worstAbsCents()).isLessThanOrEqualTo(0.1);
        // Check the claim independently: re-evaluate the solved layout from the target, not the solver's guesses.
        for (int i = 0; i < solution.notes().size(); i++) {
            var f = DemoWhistle.fingerings().get(i);
            double hz = model.soundingHz(solution.layout(), f, f.targetHz());
            assertThat(Cents.between(hz, f.targetHz())).isCloseTo(0.0, within(3.0));
        }
        // Holes stay in order with the wall between them, inside the limits.
        var layout = solution.layout();
        for (int h = 0; h + 1 < layout.holeCount(); h++) {
            double wall = (layout.position(h + 1) - layout.diameter(h + 1) / 2) - (layout.position(h) + layout.diameter(h) / 2);
            assertThat(wall).isGreaterThan(3.0 - 0.05);
        }
        assertThat(solution.evaluations()).isLessThanOrEqualTo(400);
    }

    @Test
    void cancellingStopsTheSolve() {
        var model = DemoWhistle.model();
        AtomicInteger calls = new AtomicInteger();
        assertThatThrownBy(() -> new ToneHoleSolver(1e-6, 400).solve(model, DemoWhistle.start(),
                model.lengthBeforeFootMm(), DemoWhistle.fingerings(), DemoWhistle.limits(false),
                SolveProgress.NONE, () -> calls.incrementAndGet() > 3))
                .isInstanceOf(SolveCancelledException.class);
    }

    @Test
    void progressIsReportedUpToTheCap() {
        var model = DemoWhistle.model();
        AtomicInteger last = new AtomicInteger();
        var solution = new ToneHoleSolver(1e-9, 5).solve(model, DemoWhistle.start(), model.lengthBeforeFootMm(),
                DemoWhistle.fingerings(), DemoWhistle.limits(false), (e, max, worst) -> last.set(e), () -> false);
        assertThat(last.get()).isEqualTo(5);
        assertThat(solution.evaluations()).isEqualTo(5);
        assertThat(solution.withinTolerance()).isFalse();
    }
}
