package org.nodewright.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.nodewright.inverse.DemoWhistle;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.inverse.ToneHoleSolution;
import org.nodewright.physics.inverse.ToneHoleSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The whole tone-hole solve of the workshop's six-hole whistle (seven fingerings, D5 to C#6) from
 * its first-guess holes to 0.1 cent, by the air-column core's transfer matrix model. The setup
 * checks that every solve really ends within 3 cents, so a fast wrong answer cannot pass as a figure.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 10)
@Fork(2)
public class ToneHoleSolveBenchmark {

    /** false: positions and foot; true: diameters too. */
    @Param({"false", "true"})
    public boolean varyDiameters;

    private AirCoreFrequencyModel model;
    private HoleLayout start;
    private List<Fingering> fingerings;

    @Setup(Level.Trial)
    public void setUp() {
        model = DemoWhistle.model();
        start = DemoWhistle.start();
        fingerings = DemoWhistle.fingerings();
        ToneHoleSolution check = solve();
        if (!(check.worstAbsCents() < 3.0)) {
            throw new IllegalStateException("the solve missed: worst " + check.worstAbsCents() + " cents");
        }
    }

    @Benchmark
    public ToneHoleSolution solveWhistle() {
        return solve();
    }

    private ToneHoleSolution solve() {
        return new ToneHoleSolver(0.1, 600).solve(model, start, model.lengthBeforeFootMm(), fingerings,
                DemoWhistle.limits(varyDiameters), SolveProgress.NONE, () -> false);
    }
}
