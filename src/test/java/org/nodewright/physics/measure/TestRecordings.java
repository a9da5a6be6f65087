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
     * A tap: decaying sines (each {@code decaySeconds} to 1/e) at the given frequencies and amplitudes, 16-bit mono
     * 48 kHz, with a short rise so the onset is clean.
     */
    public static byte[] tap(double[] hz, double[] amplitudes, double decaySeconds, double seconds) {
        double rate = 48_000;
        int n = (int) Math.round(seconds * rate);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            double rise = Math.min(1, t / 0.002);
            double s = 0;
            for (int k = 0; k < hz.length; k++) {
                s += amplitudes[k] * Math.sin(2 * Math.PI * hz[k] * t) * Math.exp(-t / decaySeconds);
            }
            x[i] = 0.25 * rise * s;
        }
        return SyntheticPluck.wav(x, 1, 1, 16, rate);
    }

    public static byte[] silence(int samples) {
        return SyntheticPluck.wav(new double[samples], 1, 1, 16, 48_000);
    }
}
