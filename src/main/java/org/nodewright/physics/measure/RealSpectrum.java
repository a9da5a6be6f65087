package org.nodewright.physics.measure;

import org.hipparchus.transform.DftNormalization;
import org.hipparchus.transform.FastFourierTransformer;
import org.hipparchus.transform.TransformType;

/**
 * Power spectrum |X_k|², k = 0 … N/2, of a real signal zero-padded to N points, with Hipparchus'
 * radix-2 FFT of half the size: the even and odd samples are packed as the real and imaginary
 * parts of one complex sequence and separated afterwards (E. O. Brigham, "The Fast Fourier
 * Transform", 1974, §10.10, "computing the FFT of a 2N-point real function"). Half the work of a
 * complex transform, which keeps a 10 s recording well inside its time budget.
 */
final class RealSpectrum {

    private RealSpectrum() {
    }

    /**
     * @param x    the real signal, at most {@code size} samples
     * @param size transform length, a power of two, at least 4
     */
    static double[] power(double[] x, int size) {
        if (Integer.bitCount(size) != 1 || size < 4 || x.length > size) {
            throw new IllegalArgumentException("size must be a power of two >= 4 and >= the signal, got " + size);
        }
        int m = size / 2;
        double[][] z = new double[2][m];
        for (int i = 0; i < x.length; i++) {
            z[i & 1][i >> 1] = x[i];
        }
        FastFourierTransformer.transformInPlace(z, DftNormalization.STANDARD, TransformType.FORWARD);
        double[] re = z[0];
        double[] im = z[1];
        double[] power = new double[m + 1];
        // X_k = E_k + W^k O_k, E_k = (Z_k + conj Z_{m−k}) / 2, O_k = (Z_k − conj Z_{m−k}) / (2i), W = e^{−2πi/N}.
        double step = -2 * Math.PI / size;
        double wr = 1;
        double wi = 0;
        double cr = Math.cos(step);
        double ci = Math.sin(step);
        for (int k = 0; k <= m; k++) {
            if ((k & 1023) == 0) { // re-seed the rotation now and then: no drift over a million steps
                wr = Math.cos(step * k);
                wi = Math.sin(step * k);
            }
            int a = k % m;
            int b = (m - k) % m;
            double zr = re[a];
            double zi = im[a];
            double yr = re[b];
            double yi = -im[b];
            double er = 0.5 * (zr + yr);
            double ei = 0.5 * (zi + yi);
            // (Z_k − conj Z_{m−k}) / (2i) = (dr + i di) / (2i) = (di − i dr) / 2
            double dr = zr - yr;
            double di = zi - yi;
            double or = 0.5 * di;
            double oi = -0.5 * dr;
            double xr = er + wr * or - wi * oi;
            double xi = ei + wr * oi + wi * or;
            power[k] = xr * xr + xi * xi;
            double nr = wr * cr - wi * ci;
            wi = wr * ci + wi * cr;
            wr = nr;
        }
        return power;
    }
}
