package org.nodewright.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.nodewright.physics.plates.EdgeCondition;
import org.nodewright.physics.plates.Outline;
import org.nodewright.physics.plates.Plate;
import org.nodewright.physics.plates.PlateAnalysis;
import org.nodewright.physics.plates.PlateMaterial;
import org.nodewright.physics.plates.PlateMaterials;
import org.nodewright.physics.plates.PlateSolver;
import org.nodewright.physics.plates.ThicknessField;
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
 * The work behind one {@code POST /api/v1/plates/analyze} without HTTP and JSON: 12 modes with shapes and
 * node lines of a free orthotropic spruce rectangle (400 x 300 x 3 mm), and of the Harrowgate Lane parlour top
 * (a guitar-like outline, 38 points, 2.8 mm spruce) with its six braces.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class PlateModesBenchmark {

    private final PlateMaterial spruce = PlateMaterials.byId("spruce").orElseThrow().material();
    private final Plate rectangle = new Plate(Outline.rectangle(0.4, 0.3), spruce, ThicknessField.uniform(0.003),
            EdgeCondition.FREE, List.of());
    private final Plate parlour = new Plate(WorkshopPlates.parlourOutline(), spruce, ThicknessField.uniform(0.0028),
            EdgeCondition.FREE, WorkshopPlates.parlourBraces());
    private final PlateSolver solver = new PlateSolver();

    @Benchmark
    public PlateAnalysis freeOrthotropicRectangle12Modes(StringModesBenchmark.CpuClock clock) {
        clock.ops++;
        return solver.analyze(rectangle, 12);
    }

    @Benchmark
    public PlateAnalysis bracedGuitarTop12Modes(StringModesBenchmark.CpuClock clock) {
        clock.ops++;
        return solver.analyze(parlour, 12);
    }
}
