package org.nodewright.physics.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.hipparchus.complex.Complex;
import org.hipparchus.transform.DftNormalization;
import org.hipparchus.transform.FastFourierTransformer;
import org.hipparchus.transform.TransformType;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RealSpectrumTest {

    // Reference: Hipparchus' own complex FFT of the zero-padded real signal, |X_k|².
    @ParameterizedTest(name = "{0} samples padded to {1}")
    @CsvSource({"8, 8", "100, 256", "3000, 8192", "70000, 262144"})
    void matchesTheFullComplexTransform(int samples, int size) {
        Random r = new Random(samples);
        double[] x = new double[samples];
        for (int i = 0; i < samples; i++) {
            x[i] = r.nextGaussian();
        }
        double[] padded = java.util.Arrays.copyOf(x, size);
        Complex[] reference = new FastFourierTransformer(DftNormalization.STANDARD).transform(padded, TransformType.FORWARD);
        double[] power = RealSpectrum.power(x, size);
        assertThat(power).hasSize(size / 2 + 1);
        double scale = samples; // expected |X|² ~ samples for unit-variance noise
        for (int k = 0; k <= size / 2; k++) {
            double ref = reference[k].getReal() * reference[k].getReal() + reference[k].getImaginary() * reference[k].getImaginary();
            assertThat(power[k]).isCloseTo(ref, within(1e-9 * scale));
        }
    }
}
