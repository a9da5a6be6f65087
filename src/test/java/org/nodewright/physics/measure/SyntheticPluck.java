package org.nodewright.physics.measure;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Random;

/**
 * Test recordings made from first principles: partials at f_n = n·f1·√(1+B·n²) (Fletcher 1964),
 * amplitudes of a triangular pluck at a fraction p of the length, sin(nπp)/n² (N. H. Fletcher and
 * T. D. Rossing, "The Physics of Musical Instruments", 2nd ed., 1998, §2.7), each decaying
 * exponentially with a time constant that shortens with frequency, plus white Gaussian noise; and
 * WAV bytes written by hand from the RIFF/WAVE layout.
 */
final class SyntheticPluck {

    double sampleRateHz = 48_000;
    double seconds = 3.0;
    double f1Hz = 110.0;
    double b = 1e-4;
    int partials = 30;
    double pluckFraction = 0.137;
    /** Decay time of the fundamental, s; partial n decays with tau1 / (1 + 0.05·n). */
    double tau1 = 1.5;
    double noiseRms = 1e-4;
    double leadingSilenceSeconds = 0.0;
    long seed = 7;
    /** Every partial starts equally loud (a flat spectrum) instead of the pluck's sin(nπp)/n². */
    boolean flat = false;

    SyntheticPluck f1(double hz) { f1Hz = hz; return this; }
    SyntheticPluck b(double value) { b = value; return this; }
    SyntheticPluck seconds(double s) { seconds = s; return this; }
    SyntheticPluck pluckAt(double fraction) { pluckFraction = fraction; return this; }
    SyntheticPluck noise(double rms) { noiseRms = rms; return this; }
    SyntheticPluck partials(int count) { partials = count; return this; }
    SyntheticPluck rate(double hz) { sampleRateHz = hz; return this; }
    SyntheticPluck silenceFirst(double s) { leadingSilenceSeconds = s; return this; }
    SyntheticPluck decay(double tau) { tau1 = tau; return this; }
    SyntheticPluck seed(long s) { seed = s; return this; }
    SyntheticPluck flat() { flat = true; return this; }

    double partialHz(int n) {
        return n * f1Hz * Math.sqrt(1 + b * n * n);
    }

    double[] samples() {
        int lead = (int) Math.round(leadingSilenceSeconds * sampleRateHz);
        int len = lead + (int) Math.round(seconds * sampleRateHz);
        double[] x = new double[len];
        Random rnd = new Random(seed);
        double norm = 0;
        for (int n = 1; n <= partials; n++) {
            double f = partialHz(n);
            if (f >= sampleRateHz / 2 * 0.95) {
                break;
            }
            double amp = flat ? 1.0 : Math.sin(n * Math.PI * pluckFraction) / (n * (double) n);
            double tau = tau1 / (1 + 0.05 * n);
            double phase = rnd.nextDouble() * 2 * Math.PI;
            double w = 2 * Math.PI * f / sampleRateHz;
            double decayPerSample = Math.exp(-1 / (tau * sampleRateHz));
            double env = 1;
            for (int i = lead; i < len; i++) {
                x[i] += amp * env * Math.sin(w * (i - lead) + phase);
                env *= decayPerSample;
            }
            norm += Math.abs(amp);
        }
        for (int i = 0; i < len; i++) {
            x[i] = 0.8 * x[i] / norm + noiseRms * rnd.nextGaussian();
        }
        return x;
    }

    /** PCM 16-bit WAV, {@code channels} copies of the signal (the second one scaled by 0.5). */
    byte[] wav16(int channels) {
        return wav(samples(), channels, 1, 16);
    }

    byte[] wav24(int channels) {
        return wav(samples(), channels, 1, 24);
    }

    byte[] wavFloat(int channels) {
        return wav(samples(), channels, 3, 32);
    }

    static byte[] wav(double[] x, int channels, int formatTag, int bits, double rate) {
        int bytesPerSample = bits / 8;
        int dataSize = x.length * channels * bytesPerSample;
        ByteBuffer b = ByteBuffer.allocate(44 + dataSize).order(ByteOrder.LITTLE_ENDIAN);
        b.put("RIFF".getBytes()).putInt(36 + dataSize).put("WAVE".getBytes());
        b.put("fmt ".getBytes()).putInt(16).putShort((short) formatTag).putShort((short) channels)
                .putInt((int) rate).putInt((int) rate * channels * bytesPerSample)
                .putShort((short) (channels * bytesPerSample)).putShort((short) bits);
        b.put("data".getBytes()).putInt(dataSize);
        for (double v : x) {
            for (int c = 0; c < channels; c++) {
                double s = c == 0 ? v : 0.5 * v;
                if (formatTag == 3) {
                    b.putFloat((float) s);
                } else if (bits == 16) {
                    b.putShort((short) Math.max(-32768, Math.min(32767, Math.round(s * 32768))));
                } else {
                    int q = (int) Math.max(-8388608, Math.min(8388607, Math.round(s * 8388608)));
                    b.put((byte) q).put((byte) (q >> 8)).put((byte) (q >> 16));
                }
            }
        }
        return b.array();
    }

    byte[] wav(double[] x, int channels, int formatTag, int bits) {
        return wav(x, channels, formatTag, bits, sampleRateHz);
    }

    MonoRecording recording() {
        return new MonoRecording(sampleRateHz, samples());
    }
}
