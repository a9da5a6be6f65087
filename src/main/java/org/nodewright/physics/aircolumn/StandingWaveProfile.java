package org.nodewright.physics.aircolumn;

import java.util.ArrayList;
import java.util.List;

/**
 * Pressure and volume-flow standing waves along the bore at one resonance, with the pressure
 * nodes (local minima of |p|) and antinodes (local maxima of |p|), positions in metres from the
 * input end, ascending. The shapes are signed: each is multiplied by e^{-j phi} (phi the phase at
 * its largest sample) and its real part divided by that largest magnitude, so a lossless standing
 * wave is exactly its real mode shape.
 *
 * <p>End points count as a node or an antinode only where the end condition makes them so: an open
 * input end at an impedance minimum or an ideal-open output end (p = 0) is a node, a closed end is
 * an antinode; a radiating end is neither (its node lies beyond the end, at the end correction).
 */
public record StandingWaveProfile(double frequencyHz, double[] positions, double[] pressure, double[] flow,
        List<Double> pressureNodes, List<Double> pressureAntinodes) {

    /** Samples used to locate nodes; the node is then refined by a parabola through |p|^2. */
    static final int FINE_SAMPLES = 801;

    public StandingWaveProfile {
        if (positions.length != pressure.length || positions.length != flow.length) {
            throw new IllegalArgumentException("profile arrays differ in length");
        }
        pressureNodes = List.copyOf(pressureNodes);
        pressureAntinodes = List.copyOf(pressureAntinodes);
    }

    /**
     * Computes the profile at frequency f, returning {@code samples} evenly spaced points.
     */
    public static StandingWaveProfile compute(TransferMatrixSolver solver, double f, int samples) {
        AirColumn col = solver.column();
        double total = col.length();
        int m = FINE_SAMPLES;
        double[] xs = new double[m];
        for (int j = 0; j < m; j++) {
            xs[j] = total * j / (m - 1);
        }
        double[][] s = field(solver, f, xs);
        double[] p2 = new double[m];
        double pMax = 0;
        for (int j = 0; j < m; j++) {
            p2[j] = s[0][j] * s[0][j] + s[1][j] * s[1][j];
            pMax = Math.max(pMax, p2[j]);
        }
        List<Double> nodes = new ArrayList<>();
        List<Double> antinodes = new ArrayList<>();
        if (col.inputEnd() == InputEnd.OPEN) {
            nodes.add(0.0);
        } else {
            antinodes.add(0.0);
        }
        for (int j = 1; j < m - 1; j++) {
            if (p2[j] < p2[j - 1] && p2[j] <= p2[j + 1] && p2[j] < 0.25 * pMax) {
                nodes.add(vertex(xs, p2, j));
            } else if (p2[j] > p2[j - 1] && p2[j] >= p2[j + 1] && p2[j] > 0.01 * pMax) {
                antinodes.add(vertex(xs, p2, j));
            }
        }
        if (col.outputEnd() == OutputEnd.IDEAL_OPEN) {
            nodes.add(total);
        } else if (col.outputEnd() == OutputEnd.CLOSED) {
            antinodes.add(total);
        }
        int k = Math.max(2, samples);
        double[] px = new double[k];
        int[] idx = new int[k];
        for (int j = 0; j < k; j++) {
            idx[j] = (int) Math.round((double) j * (m - 1) / (k - 1));
            px[j] = xs[idx[j]];
        }
        double[] pressure = signedShape(s[0], s[1], idx);
        double[] flow = signedShape(s[2], s[3], idx);
        return new StandingWaveProfile(f, px, pressure, flow, nodes, antinodes);
    }

    /**
     * Pressure and volume flow along the bore at frequency f (Hz), sampled at the given positions
     * (ascending, metres from the input end, clamped to 0..L), on a common arbitrary scale: the
     * caller normalises. The load and every element of the solver's chain are applied from the
     * output end with library sines and cosines, the state kept at each element's downstream side;
     * a sample inside a duct then takes that duct's tail from the sample to its downstream end.
     *
     * @return {pRe[], pIm[], uRe[], uIm[]}
     */
    public static double[][] field(TransferMatrixSolver solver, double f, double[] positions) {
        ElementChain chain = solver.chain();
        DuctKernel.Frequency w = solver.frequencyTerms().at(f);
        double k = w.k;
        int count = chain.size();
        DuctKernel.State[] downstream = new DuctKernel.State[count];
        DuctKernel.State st = new DuctKernel.State();
        solver.load(k, st);
        for (int e = count - 1; e >= 0; e--) {
            downstream[e] = st.copy();
            ChainElement el = chain.get(e);
            double th = k * el.rotationLength();
            el.propagate(w, Math.cos(th), -Math.sin(th), st);
        }
        int m = positions.length;
        double[][] out = new double[4][m];
        double total = chain.length();
        for (int j = 0; j < m; j++) {
            double x = Math.min(Math.max(positions[j], 0), total);
            int e = chain.ductIndexAt(x);
            Duct d = (Duct) chain.get(e);
            DuctKernel.State s = downstream[e].copy();
            if (d.end() - x > 0) {
                Duct tail = x > d.start ? d.tail(x) : d;
                double th = k * tail.rotationLength();
                tail.propagate(w, Math.cos(th), -Math.sin(th), s);
            }
            out[0][j] = s.pr;
            out[1][j] = s.pi;
            out[2][j] = s.ur;
            out[3][j] = s.ui;
        }
        return out;
    }

    /** Vertex of the parabola through the three samples around j. */
    private static double vertex(double[] x, double[] y, int j) {
        double h = x[j + 1] - x[j];
        double den = y[j - 1] - 2 * y[j] + y[j + 1];
        if (den == 0) {
            return x[j];
        }
        double t = 0.5 * (y[j - 1] - y[j + 1]) / den;
        return x[j] + Math.max(-1, Math.min(1, t)) * h;
    }

    private static double[] signedShape(double[] re, double[] im, int[] idx) {
        int best = 0;
        double bestMag = -1;
        for (int j = 0; j < re.length; j++) {
            double mag = re[j] * re[j] + im[j] * im[j];
            if (mag > bestMag) {
                bestMag = mag;
                best = j;
            }
        }
        double mag = Math.sqrt(bestMag);
        double[] out = new double[idx.length];
        if (mag == 0) {
            return out;
        }
        double cr = re[best] / mag;
        double ci = -im[best] / mag;
        for (int j = 0; j < idx.length; j++) {
            out[j] = (re[idx[j]] * cr - im[idx[j]] * ci) / mag;
        }
        return out;
    }
}
