package org.nodewright.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.nodewright.physics.aircolumn.AirColumn;
import org.nodewright.physics.aircolumn.AirColumnAnalyzer;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.aircolumn.ToneHole;
import org.nodewright.physics.aircolumn.TransferMatrixSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The speed case: a 200-element conical bore (600 mm, 12 to 48 mm diameter, Harrowgate
 * Lane Workshop's demo conical bore cut into 3 mm frusta) with 8 open holes, wall losses on,
 * 4000 frequencies from 20 to 3000 Hz. {@code sweep} is the impedance curve alone (its 200
 * collinear frusta are joined into one cone, then cut again for the losses);
 * {@code sweepCurvedBore} is a curved bore whose 200 frusta all differ; {@code analyze} adds the
 * refined resonances, Q, standing waves and nodes (what the endpoint does).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 6, time = 1)
@Fork(2)
public class AirColumnBenchmark {

    static final int POINTS = 4000;

    AirColumn column;
    TransferMatrixSolver solver;
    TransferMatrixSolver curvedSolver;
    double[] re = new double[POINTS];
    double[] im = new double[POINTS];

    @Setup
    public void setUp() {
        List<BoreSegment> segs = new ArrayList<>();
        int n = 200;
        double len = 0.600;
        for (int i = 0; i < n; i++) {
            double ra = 0.006 + 0.018 * i / n;
            double rb = 0.006 + 0.018 * (i + 1) / n;
            segs.add(new BoreSegment(len / n, ra, rb));
        }
        List<ToneHole> holes = new ArrayList<>();
        for (int h = 0; h < 8; h++) {
            holes.add(new ToneHole(0.2505 + 0.040 * h, 0.004, 0.004, true));
        }
        column = new AirColumn(segs, holes, InputEnd.CLOSED, OutputEnd.OPEN_UNFLANGED, AirProperties.at(20, 50),
                true);
        solver = new TransferMatrixSolver(column);
        // The same length, ends and holes on a gently curved (quadratic) profile: every one of the 200
        // frusta has its own taper, so none can be joined.
        List<BoreSegment> curved = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double ua = (double) i / n;
            double ub = (double) (i + 1) / n;
            curved.add(new BoreSegment(len / n, 0.006 + 0.018 * ua * ua, 0.006 + 0.018 * ub * ub));
        }
        List<ToneHole> smallHoles = new ArrayList<>();
        for (int h = 0; h < 8; h++) {
            smallHoles.add(new ToneHole(0.2505 + 0.040 * h, 0.0025, 0.004, true));
        }
        curvedSolver = new TransferMatrixSolver(new AirColumn(curved, smallHoles, InputEnd.CLOSED,
                OutputEnd.OPEN_UNFLANGED, AirProperties.at(20, 50), true));
    }

    /** 200 distinct frusta, 8 open holes, losses on, 4000 frequencies: no joining possible. */
    @Benchmark
    public double sweepCurvedBore() {
        curvedSolver.inputImpedance(20, (3000.0 - 20) / (POINTS - 1), POINTS, re, im);
        return re[POINTS / 2] + im[POINTS - 1];
    }

    @Benchmark
    public double sweep() {
        solver.inputImpedance(20, (3000.0 - 20) / (POINTS - 1), POINTS, re, im);
        return re[POINTS / 2] + im[POINTS - 1];
    }

    @Benchmark
    public Object analyze() {
        return new AirColumnAnalyzer(440, 201).analyze(column, 20, 3000, POINTS, List.of());
    }
}
