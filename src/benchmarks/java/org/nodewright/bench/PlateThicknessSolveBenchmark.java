package org.nodewright.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.plates.EdgeCondition;
import org.nodewright.physics.plates.Outline;
import org.nodewright.physics.plates.Plate;
import org.nodewright.physics.plates.PlateMaterial;
import org.nodewright.physics.plates.PlateMaterials;
import org.nodewright.physics.plates.ThicknessField;
import org.nodewright.physics.plates.ThicknessTuner;
import org.nodewright.physics.plates.WorkshopPlates;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One plate thickness solve without the job queue: the spruce test rectangle's mode 1 to 95 % of its frequency by
 * its uniform thickness (10 modes per analysis, as the bench), and the Harrowgate Lane parlour top's modes 1 and 2
 * lowered 3 % by its thickness and the height of its second brace, with the sensitivities (7 evaluations to
 * 0.003 cent when probed).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
public class PlateThicknessSolveBenchmark {

    private final PlateMaterial spruce = PlateMaterials.byId("spruce").orElseThrow().material();
    private final Plate rectangle = new Plate(Outline.rectangle(0.4, 0.3), spruce, ThicknessField.uniform(0.003),
            EdgeCondition.FREE, List.of());
    private final Plate parlour = new Plate(WorkshopPlates.parlourOutline(), spruce, ThicknessField.uniform(0.0028),
            EdgeCondition.FREE, WorkshopPlates.parlourBraces());
    // mode 1 of the rectangle (≈ 32.9 Hz on the bench) and modes 1-2 of the parlour top, lowered
    private final List<ThicknessTuner.Target> rectangleTarget = List.of(new ThicknessTuner.Target(1, 31.29));

    @Benchmark
    public ThicknessTuner.Solution testRectangleUniformThickness() {
        return new ThicknessTuner(0.5, 200).solve(rectangle, rectangleTarget,
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, 0.0015, 0.003)), 10,
                SolveProgress.NONE, () -> false);
    }

    @Benchmark
    public ThicknessTuner.Solution parlourTopThicknessAndOneBrace() {
        double[] f = new org.nodewright.physics.plates.PlateSolver().frequencies(parlour, 10);
        List<ThicknessTuner.Target> targets = List.of(new ThicknessTuner.Target(1, 0.97 * f[0]),
                new ThicknessTuner.Target(2, 0.97 * f[1]));
        double h1 = parlour.braces().get(1).heightM();
        return new ThicknessTuner(0.5, 200).solve(parlour, targets,
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, 0.0014, 0.0028),
                        new ThicknessTuner.Unknown(ThicknessTuner.Kind.BRACE_HEIGHT, 1, h1 / 3, h1)),
                10, SolveProgress.NONE, () -> false);
    }
}
