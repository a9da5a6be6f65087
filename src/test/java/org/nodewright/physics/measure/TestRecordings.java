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

    public static byte[] silence(int samples) {
        return SyntheticPluck.wav(new double[samples], 1, 1, 16, 48_000);
    }
}
