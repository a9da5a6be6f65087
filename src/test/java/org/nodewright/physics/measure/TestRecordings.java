package org.nodewright.physics.measure;

/** WAV files for the web-layer tests, made by {@link SyntheticPluck}. */
public final class TestRecordings {

    private TestRecordings() {
    }

    /** A pluck at 0.137 of the length, 1.5 s decay, noise at −60 dB, 48 kHz. */
    public static byte[] pluck(double f1Hz, double b, double seconds, int bits, int channels) {
        SyntheticPluck s = new SyntheticPluck().f1(f1Hz).b(b).seconds(seconds).noise(1e-3);
        return switch (bits) {
            case 16 -> s.wav16(channels);
            case 24 -> s.wav24(channels);
            default -> s.wavFloat(channels);
        };
    }

    /**
     * A tapped bar: exponentially decaying sines at the given frequencies and amplitudes (each decaying
     * in 0.6 s / √(f / f₁), the higher modes of a wooden bar dying first), 16-bit mono at 48 kHz,
     * with a seeded noise floor at −66 dB.
     */
    public static byte[] tap(double[] hz, double[] amplitude, double seconds) {
        double rate = 48_000;
        double[] x = new double[(int) (seconds * rate)];
        java.util.Random noise = new java.util.Random(11);
        for (int i = 0; i < x.length; i++) {
            double t = i / rate;
            double v = 5e-4 * noise.nextGaussian();
            for (int k = 0; k < hz.length; k++) {
                double tau = 0.6 / Math.sqrt(hz[k] / hz[0]);
                v += amplitude[k] * Math.exp(-t / tau) * Math.sin(2 * Math.PI * hz[k] * t);
            }
            x[i] = v;
        }
        return SyntheticPluck.wav(x, 1, 1, 16, rate);
    }

    /**
     * {@code silenceSeconds} of room noise (−60 dB), then a pluck as {@link #pluck} lasting {@code seconds}:
     * 16-bit mono at 48 kHz, for a fake microphone that loops the file and an onset detector that must find the attack.
     */
    public static byte[] pluckAfterSilence(double f1Hz, double b, double silenceSeconds, double seconds) {
        return new SyntheticPluck().f1(f1Hz).b(b).seconds(seconds).noise(1e-3).silenceFirst(silenceSeconds).wav16(1);
    }

    public static byte[] silence(int samples) {
        return SyntheticPluck.wav(new double[samples], 1, 1, 16, 48_000);
    }
}
