package org.nodewright.bench;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.nodewright.physics.measure.PartialAnalyzer;
import org.nodewright.physics.measure.PartialFit;
import org.nodewright.physics.measure.WavReader;
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
 * Reading and analysing a 10-second, 48 kHz, 16-bit mono recording of a plucked string (30
 * partials of Fletcher's law, f1 = 110 Hz, B = 1e-4, 3 s decay, noise at −60 dB): WAV decode,
 * window, FFT, peaks, matching and fit, as the measurement endpoint does. Target: under 300 ms.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 2, jvmArgs = {"-Xmx1g"})
public class PartialsBenchmark {

    private byte[] wav;

    @Setup(Level.Trial)
    public void synthesise() {
        int rate = 48_000;
        int len = 10 * rate;
        double[] x = new double[len];
        Random rnd = new Random(42);
        for (int n = 1; n <= 30; n++) {
            double f = n * 110.0 * Math.sqrt(1 + 1e-4 * n * n); // Fletcher 1964, eq. 11
            double amp = Math.sin(n * Math.PI * 0.137) / (n * (double) n); // triangular pluck
            double decay = Math.exp(-(1 + 0.05 * n) / (3.0 * rate));
            double env = 0.3;
            double w = 2 * Math.PI * f / rate;
            double phase = rnd.nextDouble() * 2 * Math.PI;
            for (int i = 0; i < len; i++) {
                x[i] += amp * env * Math.sin(w * i + phase);
                env *= decay;
            }
        }
        ByteBuffer b = ByteBuffer.allocate(44 + 2 * len).order(ByteOrder.LITTLE_ENDIAN);
        b.put("RIFF".getBytes()).putInt(36 + 2 * len).put("WAVE".getBytes());
        b.put("fmt ".getBytes()).putInt(16).putShort((short) 1).putShort((short) 1).putInt(rate).putInt(2 * rate)
                .putShort((short) 2).putShort((short) 16);
        b.put("data".getBytes()).putInt(2 * len);
        for (double v : x) {
            b.putShort((short) Math.round(32767 * Math.max(-1, Math.min(1, v + 1e-3 * rnd.nextGaussian()))));
        }
        wav = b.array();
    }

    @Benchmark
    public PartialFit analyseTenSecondRecording() {
        return PartialAnalyzer.analyze(WavReader.read(wav), null, PartialAnalyzer.DEFAULT_MAX_PARTIALS);
    }
}
