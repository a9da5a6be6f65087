package org.nodewright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.nodewright.physics.strings.EndCondition;
import org.nodewright.physics.strings.ExcitationKind;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.strings.Pickup;
import org.nodewright.physics.strings.PickupCombination;
import org.nodewright.physics.strings.StringAnalysis;
import org.nodewright.physics.strings.StringAnalyzer;
import org.nodewright.physics.strings.StringConstruction;
import org.nodewright.physics.strings.StringDesign;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A complete 24-mode analysis of one string, in process: tension solved from a target pitch,
 * stiffness on, a pluck and two pickups combined in opposite phase — the work behind one
 * {@code POST /api/v1/strings/analyze}, without HTTP and JSON. Pinned ends use Fletcher's closed
 * form; clamped ends solve the beam-under-tension equation per mode and locate every node and
 * antinode of the computed shapes.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(2)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
public class StringModesBenchmark {

    /** Harrowgate Lane Workshop's 650 mm test string: 0.30 mm plain steel tuned to E4. */
    private final StringDesign pinned = design(EndCondition.PINNED);
    private final StringDesign clamped = design(EndCondition.CLAMPED);
    private final StringAnalyzer analyzer = new StringAnalyzer();

    private static StringDesign design(EndCondition end) {
        StringConstruction c = StringConstruction.plain(Materials.get("plain-steel"), 0.30e-3);
        return new StringDesign(0.650, null, 329.63, c.linearDensityKgPerM(), c.bendingStiffnessNm2(), end,
                0.30e-3, c.core().tensileStrengthPa(), 24, ExcitationKind.PLUCK, 0.120,
                List.of(new Pickup(0.150, 0.012), new Pickup(0.600, 0.0)), PickupCombination.OPPOSITE, 440.0);
    }

    @Benchmark
    public StringAnalysis pinned24Modes(CpuClock clock) {
        clock.ops++;
        return analyzer.analyze(pinned);
    }

    @Benchmark
    public StringAnalysis clamped24Modes(CpuClock clock) {
        clock.ops++;
        return analyzer.analyze(clamped);
    }

    /**
     * JMH scores wall-clock time; on a shared, overloaded machine that includes time the thread
     * spent waiting for a core. This prints, per measured iteration, the benchmark thread's own CPU
     * time per operation (ThreadMXBean), as a second figure beside the score.
     */
    @State(Scope.Thread)
    public static class CpuClock {
        private final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        long ops;
        private long startNanos;

        @Setup(Level.Iteration)
        public void start() {
            ops = 0;
            startNanos = threads.getCurrentThreadCpuTime();
        }

        @TearDown(Level.Iteration)
        public void stop() {
            double perOp = (threads.getCurrentThreadCpuTime() - startNanos) / 1e3 / Math.max(ops, 1);
            System.out.printf(java.util.Locale.ROOT, "  [thread CPU time %.1f us/op over %d ops]%n", perOp, ops);
        }
    }
}
