package org.nodewright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.concurrent.TimeUnit;
import org.nodewright.physics.bars.Bar;
import org.nodewright.physics.bars.BarAnalysis;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.bars.BarEnds;
import org.nodewright.physics.bars.BarMaterial;
import org.nodewright.physics.bars.BarMaterials;
import org.nodewright.physics.bars.BeamTheory;
import org.nodewright.physics.bars.RectangleSection;
import org.nodewright.physics.bars.TuningLimits;
import org.nodewright.physics.bars.TuningTargets;
import org.nodewright.physics.bars.UndercutShape;
import org.nodewright.physics.bars.UndercutSolution;
import org.nodewright.physics.bars.UndercutTuner;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.tuning.EqualTemperament;
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
 * The bar bench in process: a 6-mode Timoshenko analysis of an undercut marimba bar (all three
 * families, nodes, antinodes and shapes: the work behind one POST /api/v1/bars/analyze without HTTP),
 * and the tuning solve of a rosewood-like marimba bar to F3 at 1:4:10 within ±3 cents.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(2)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 5, time = 1)
public class BarBenchmark {

    private static final BarMaterial ROSEWOOD = BarMaterials.byId("rosewood").orElseThrow();
    private static final double LENGTH = 0.440;

    /** The workshop's marimba bar: 440 x 60 x 22 mm with a 13.9 mm deep undercut (as the solver cut it). */
    private final Bar undercut = blank().withSection(new RectangleSection(0.060,
            new UndercutShape(0.0139, 0.1085, 0.926).profile(LENGTH, 0.022)), LENGTH);

    private static Bar blank() {
        return new Bar(LENGTH, RectangleSection.uniform(0.060, 0.022, LENGTH), ROSEWOOD.density(),
                ROSEWOOD.youngsModulus(), ROSEWOOD.shearModulus(), BarEnds.FREE_FREE);
    }

    @Benchmark
    public BarAnalysis undercutSixModes(CpuClock clock) {
        clock.ops++;
        return BarAnalyzer.analyze(undercut, BeamTheory.TIMOSHENKO, 6, true);
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @Warmup(iterations = 3)
    @Measurement(iterations = 10)
    public UndercutSolution tuneMarimbaF3(CpuClock clock) {
        clock.ops++;
        double f1 = EqualTemperament.iso16().frequencyOf(53);
        UndercutSolution s = new UndercutTuner(3.0, 400).solve(blank(), BeamTheory.TIMOSHENKO,
                new TuningTargets(f1, new double[] {4, 10}), new TuningLimits(0.004, 0.060, LENGTH, LENGTH), null,
                SolveProgress.NONE, () -> false);
        if (!s.converged()) {
            throw new IllegalStateException("the benchmark's solve did not reach +-3 cents: " + s.worstCents());
        }
        return s;
    }

    /** Thread CPU time per operation beside JMH's wall-clock score (the machine is shared). */
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
            double perOp = (threads.getCurrentThreadCpuTime() - startNanos) / 1e6 / Math.max(ops, 1);
            System.out.printf(java.util.Locale.ROOT, "  [thread CPU time %.2f ms/op over %d ops]%n", perOp, ops);
        }
    }
}
