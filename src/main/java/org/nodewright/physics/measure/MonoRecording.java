package org.nodewright.physics.measure;

/**
 * A recording mixed down to one channel, samples scaled to full scale = 1.0.
 *
 * @param sampleRateHz samples per second, positive
 * @param samples      the signal (copied in and out: the record stays immutable)
 */
public record MonoRecording(double sampleRateHz, double[] samples) {

    public MonoRecording {
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz);
        }
        if (samples == null || samples.length == 0) {
            throw new IllegalArgumentException("a recording needs at least one sample");
        }
        samples = samples.clone();
    }

    @Override
    public double[] samples() {
        return samples.clone();
    }

    /** Number of samples, without copying them. */
    public int length() {
        return samples.length;
    }

    /** One sample, without copying the array. */
    public double sample(int i) {
        return samples[i];
    }

    public double durationSeconds() {
        return samples.length / sampleRateHz;
    }
}
