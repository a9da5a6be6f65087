package org.nodewright.physics.aircolumn;

import java.util.List;
import java.util.stream.IntStream;

/**
 * The transfer matrix method for a bore of cylinders and conical frusta with side holes: the state
 * (pressure P, volume flow U) is carried from the output end (its load, {@link Radiation#outputLoad})
 * to the input end through each element of the bore's {@link ElementChain}, so P and U stay
 * continuous across every step in radius. Impedances are kept divided by rho c (units 1/m^2).
 * Ducts use {@link DuctKernel}, holes the T network of {@link ToneHoleModel}; the standing waves
 * ({@link StandingWaveProfile}) run the same chain and kernel. A {@link MouthStage} at the input end
 * (when the column has a mouth) carries the state from x = 0 to the player's side; with a breath
 * every element sits in its own air ({@link LocalAir}) and impedances are referred to the air at
 * x = 0.
 *
 * <p>Speed: on a uniform grid e^{-jkL} of each element is advanced by one complex rotation per
 * frequency (re-seeded exactly every 128 steps), so most element-frequency pairs need no sine,
 * cosine or exponential at all (see {@link DuctKernel} for the rest), and the frequencies run in
 * chunks on two threads. CurvedBoreSweepTest checks the sweep against the same chain with library
 * sines and cosines.
 */
public final class TransferMatrixSolver {

    private static final int RESEED = 128;
    /** Below this many element-frequency pairs a sweep runs on the calling thread only. */
    private static final long PARALLEL_WORK = 200_000;
    private static final int CHUNK = 512;

    private final AirColumn column;
    private final KeefeExpansion keefe;
    private final ElementChain chain;
    private final ChainElement[] elements;
    private final double inputArea;
    private final double outputRadius;
    private final AirProperties referenceAir;
    private final LocalAir outputAir;
    /** The player's end, or null for a bare input end. */
    private final MouthStage mouth;

    public TransferMatrixSolver(AirColumn column) {
        this.column = column;
        this.referenceAir = column.referenceAir();
        this.keefe = KeefeExpansion.forAir(referenceAir);
        this.chain = ElementChain.of(column, keefe);
        this.elements = chain.toArray();
        this.outputAir = chain.outputAir();
        List<BoreSegment> segments = column.segments();
        BoreSegment first = segments.get(0);
        inputArea = Math.PI * first.inputRadius() * first.inputRadius();
        outputRadius = segments.get(segments.size() - 1).outputRadius();
        mouth = column.mouth() == null ? null
                : new MouthStage(column.mouth(), first.inputRadius(), LocalAir.reference(referenceAir, keefe));
    }

    public AirColumn column() {
        return column;
    }

    ElementChain chain() {
        return chain;
    }

    KeefeExpansion keefe() {
        return keefe;
    }

    /** Number of elements (bore pieces and holes) in the chain. */
    public int elementCount() {
        return chain.size();
    }

    /** Area of the input end, m^2. */
    public double inputArea() {
        return inputArea;
    }

    /** Fresh per-thread frequency terms for this bore. */
    DuctKernel.Frequency frequencyTerms() {
        return new DuctKernel.Frequency(referenceAir, keefe, column.losses());
    }

    /** The air impedances are referred to (the air inside at x = 0). */
    public AirProperties referenceAir() {
        return referenceAir;
    }

    /** The cup's Helmholtz frequency (Hz) when the mouth is a cup, else NaN. */
    public double mouthHelmholtzHz() {
        return mouth == null ? Double.NaN : mouth.helmholtzHz(referenceAir.speedOfSound());
    }

    /** Writes the output end's load at reference wavenumber k into s (in the output end's air). */
    void load(double k, DuctKernel.State s) {
        Radiation.outputLoad(column.outputEnd(), k * outputAir.kappa(), outputRadius, s);
        double zeta = outputAir.zeta();
        s.pr *= zeta;
        s.pi *= zeta;
    }

    /**
     * Input impedance divided by rho c / S_input on the uniform grid f0 + i df, i = 0..n-1.
     *
     * @throws IllegalArgumentException for a non-positive f0, negative df or short output arrays
     */
    public void inputImpedance(double f0, double df, int n, double[] outRe, double[] outIm) {
        if (!(f0 > 0) || !(df >= 0) || n < 1 || outRe.length < n || outIm.length < n) {
            throw new IllegalArgumentException("need f0 > 0, df >= 0, n >= 1 and arrays of n: f0=" + f0 + " df=" + df
                    + " n=" + n);
        }
        int chunks = (n + CHUNK - 1) / CHUNK;
        if ((long) n * elements.length >= PARALLEL_WORK && chunks > 1) {
            // Frequencies are independent: chunks run on the common pool (and this thread).
            IntStream.range(0, chunks).parallel()
                    .forEach(ch -> sweep(f0, df, ch * CHUNK, Math.min(n, (ch + 1) * CHUNK), outRe, outIm));
        } else {
            sweep(f0, df, 0, n, outRe, outIm);
        }
    }

    private void sweep(double f0, double df, int from, int to, double[] outRe, double[] outIm) {
        int count = elements.length;
        // e^{-jk l} of every element (l = rotationLength), advanced by rotation.
        double[] rotRe = new double[count];
        double[] rotIm = new double[count];
        double[] stepRe = new double[count];
        double[] stepIm = new double[count];
        double[] rotLen = new double[count];
        double dk = 2 * Math.PI * df / referenceAir.speedOfSound();
        for (int e = 0; e < count; e++) {
            rotLen[e] = elements[e].rotationLength();
            stepRe[e] = Math.cos(dk * rotLen[e]);
            stepIm[e] = -Math.sin(dk * rotLen[e]);
        }
        DuctKernel.Frequency w = frequencyTerms();
        DuctKernel.State s = new DuctKernel.State();
        for (int i = from; i < to; i++) {
            w.at(f0 + i * df);
            double k = w.k;
            boolean reseed = (i - from) % RESEED == 0;
            load(k, s);
            for (int e = count - 1; e >= 0; e--) {
                double er;
                double ei;
                if (reseed) {
                    double th = k * rotLen[e];
                    er = Math.cos(th);
                    ei = -Math.sin(th);
                } else {
                    double or = rotRe[e];
                    double oi = rotIm[e];
                    er = or * stepRe[e] - oi * stepIm[e];
                    ei = or * stepIm[e] + oi * stepRe[e];
                }
                rotRe[e] = er;
                rotIm[e] = ei;
                elements[e].propagate(w, er, ei, s);
            }
            if (mouth != null) {
                mouth.apply(w, s);
            }
            double d = s.ur * s.ur + s.ui * s.ui;
            outRe[i] = (s.pr * s.ur + s.pi * s.ui) / d * inputArea;
            outIm[i] = (s.pi * s.ur - s.pr * s.ui) / d * inputArea;
        }
    }

    /** Input impedance / (rho c / S_input) at one frequency, {re, im}. */
    public double[] inputImpedance(double f) {
        double[] re = new double[1];
        double[] im = new double[1];
        inputImpedance(f, 0, 1, re, im);
        return new double[] {re[0], im[0]};
    }

    /** Positions of the element boundaries along the bore, metres (for sampling profiles). */
    public double[] boundaries() {
        return chain.boundaries();
    }
}
