package org.nodewright.bench;

import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.nodewright.inverse.DemoWhistle;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.Mouth;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.BlankTubeSolver;
import org.nodewright.physics.inverse.FirstLayout;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.ModelFreedom;
import org.nodewright.physics.inverse.MouthFreedom;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.inverse.SolverLimits;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * Holes from a blank: the workshop's 13 mm x 280 mm tube with its 4 x 8 mm window, six holes,
 * the D-major chart over two registers (13 fingerings), closed-form first layout then the
 * multi-start tone-hole solve to 3 cents, as the blank-tube endpoint runs it with the demo's limits
 * (the window's headspace free to move within 0..13 mm with the holes).
 * The setup prints the worst cents so the figure is read beside what it achieved.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(1)
public class BlankTubeSolveBenchmark {

    private AirCoreFrequencyModel model;
    private FirstLayout.Tube tube;
    private double[] chimneys;
    private List<Fingering> fingerings;
    private SolverLimits limits;
    private ModelFreedom freedom;

    @Setup(Level.Trial)
    public void setUp() {
        AirProperties air = AirProperties.at(DemoWhistle.TEMPERATURE_C, DemoWhistle.HUMIDITY_PCT);
        Mouth window = new Mouth.Window(DemoWhistle.WINDOW_LENGTH_MM * 1e-3, DemoWhistle.WINDOW_WIDTH_MM * 1e-3,
                DemoWhistle.WINDOW_WALL_MM * 1e-3, 0);
        List<BoreSegment> blank = List.of(new BoreSegment(DemoWhistle.BLANK_LENGTH_MM * 1e-3, DemoWhistle.BORE_MM * 0.5e-3,
                DemoWhistle.BORE_MM * 0.5e-3));
        chimneys = new double[6];
        Arrays.fill(chimneys, DemoWhistle.CHIMNEY_MM);
        model = new AirCoreFrequencyModel(blank, chimneys, InputEnd.OPEN, OutputEnd.OPEN_UNFLANGED, air, true, window, null);
        AirCoreFrequencyModel bare = new AirCoreFrequencyModel(blank, new double[0], InputEnd.OPEN,
                OutputEnd.OPEN_UNFLANGED, air, true, window, null);
        double c = air.speedOfSound();
        double out = 0.6133 * DemoWhistle.BORE_MM / 2;
        double guess = c * 1e3 / (2 * (DemoWhistle.BLANK_LENGTH_MM + out + 1.5 * DemoWhistle.BORE_MM));
        double f0 = bare.soundingHz(new HoleLayout(new double[0], new double[0], DemoWhistle.BLANK_LENGTH_MM),
                new Fingering("blank", java.util.Set.of(), guess, 1), guess);
        tube = new FirstLayout.Tube(DemoWhistle.BLANK_LENGTH_MM, DemoWhistle.BORE_MM, c,
                c * 1e3 / (2 * f0) - DemoWhistle.BLANK_LENGTH_MM - out, out, false);
        fingerings = DemoWhistle.twoRegisterFingerings();
        limits = new SolverLimits(40, 10, 3, 3, 11, true, true, 200, DemoWhistle.BLANK_LENGTH_MM);
        freedom = MouthFreedom.of(model, new MouthFreedom.Range(0, DemoWhistle.BORE_MM), null);
        BlankTubeSolver.Result r = solve();
        System.out.println("blank tube: worst " + r.best().solution().worstAbsCents() + " cents after "
                + r.starts().size() + " starts; notes " + r.best().solution().notes() + "; mouth "
                + r.best().solution().modelChanges());
    }

    @Benchmark
    public BlankTubeSolver.Result solveBlank() {
        return solve();
    }

    private BlankTubeSolver.Result solve() {
        return new BlankTubeSolver(3.0, 500).solve(model, tube, chimneys, 0, fingerings, limits, freedom,
                new double[] {6.5, 8.06, 5.2, 9.36}, SolveProgress.NONE, () -> false);
    }
}
