package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.inverse.SolveCancelledException;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.tuning.Cents;
import org.nodewright.physics.tuning.EqualTemperament;

/** The inverse design of an undercut: targets reached by the tool's own model, limits kept. */
class UndercutTunerTest {

    private static final double W = 0.060;
    private static final double T0 = 0.022;

    private static Bar blank(double length) {
        BarMaterial rosewood = BarMaterials.byId("rosewood").orElseThrow();
        return new Bar(length, RectangleSection.uniform(W, T0, length), rosewood.density(), rosewood.youngsModulus(),
                rosewood.shearModulus(), BarEnds.FREE_FREE);
    }

    // Targets: F3 (MIDI 53, equal temperament at A4 = 440 Hz) with 1:4:10 (common marimba practice),
    // and A4 with 1:3:6 (common xylophone practice); the solve must reach ±3 cents on every mode, as
    // re-analysed afresh, within 200 evaluations, keep 4 mm of wood and 60 mm flat ends.
    @ParameterizedTest(name = "MIDI {0}, 1:{1}:{2}, {3} mm bar")
    @CsvSource(textBlock = """
            53, 4.0, 10.0, 440
            53, 4.0, 10.0, 480
            69, 3.0, 6.0,  380
            """)
    void reachesTheTargetsWithinTheLimits(int midi, double r2, double r3, double lengthMm) {
        double f1 = EqualTemperament.iso16().frequencyOf(midi);
        double len = lengthMm / 1000;
        TuningLimits limits = new TuningLimits(0.004, 0.060, len, len);
        int[] lastEvaluations = {0};
        SolveProgress progress = (e, cap, worst) -> lastEvaluations[0] = e;
        UndercutSolution s = new UndercutTuner(0.5, 200).solve(blank(len), BeamTheory.TIMOSHENKO,
                new TuningTargets(f1, new double[] {r2, r3}), limits, null, progress, () -> false);
        assertThat(s.converged()).isTrue();
        assertThat(s.evaluations()).isLessThanOrEqualTo(200).isEqualTo(lastEvaluations[0]);
        double[] again = BarAnalyzer.bendingFrequencies(s.bar(), BeamTheory.TIMOSHENKO, 3);
        assertThat(Cents.between(again[0], f1)).isCloseTo(0.0, within(3.0));
        assertThat(Cents.between(again[1], r2 * f1)).isCloseTo(0.0, within(3.0));
        assertThat(Cents.between(again[2], r3 * f1)).isCloseTo(0.0, within(3.0));
        ThicknessProfile p = ((RectangleSection) s.bar().section()).profile();
        assertThat(p.minimumThickness()).isGreaterThanOrEqualTo(0.004 - 1e-12);
        assertThat(p.thicknessAt(0.059)).isEqualTo(T0);
        assertThat(p.thicknessAt(len - 0.059)).isEqualTo(T0);
    }

    @Test
    void aFreeLengthStaysInsideItsRange() {
        double f1 = EqualTemperament.iso16().frequencyOf(53);
        TuningLimits limits = new TuningLimits(0.004, 0.060, 0.380, 0.520); // the 400 mm start is too short for F3: it steps longer
        UndercutSolution s = new UndercutTuner(0.5, 400).solve(blank(0.40), BeamTheory.TIMOSHENKO,
                new TuningTargets(f1, new double[] {4, 10}), limits, null, SolveProgress.NONE, () -> false);
        assertThat(s.bar().length()).isBetween(0.400, 0.520);
        assertThat(s.worstCents()).isLessThan(3.0);
    }

    @Test
    void cancelStopsTheSolveAndTheCapEndsItWithTheBestSoFar() {
        double f1 = EqualTemperament.iso16().frequencyOf(53);
        TuningLimits limits = new TuningLimits(0.004, 0.060, 0.44, 0.44);
        TuningTargets targets = new TuningTargets(f1, new double[] {4, 10});
        assertThatThrownBy(() -> new UndercutTuner(0.5, 200).solve(blank(0.44), BeamTheory.TIMOSHENKO, targets,
                limits, null, SolveProgress.NONE, () -> true)).isInstanceOf(SolveCancelledException.class);
        UndercutSolution capped = new UndercutTuner(0.01, 3).solve(blank(0.44), BeamTheory.TIMOSHENKO, targets,
                limits, null, SolveProgress.NONE, () -> false);
        assertThat(capped.evaluations()).isEqualTo(3);
        assertThat(capped.converged()).isFalse();
    }
}
