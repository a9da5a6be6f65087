package org.nodewright.physics.measure;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/**
 * Reads a RIFF/WAVE file (Microsoft/IBM "Multimedia Programming Interface and Data Specifications
 * 1.0", 1991, and the WAVE_FORMAT_EXTENSIBLE addendum): PCM 16 or 24 bit, or IEEE 32-bit float,
 * one or two channels; two channels are averaged to one. Anything else is refused with a message
 * naming what was found.
 */
public final class WavReader {

    private static final int FORMAT_PCM = 1;
    private static final int FORMAT_IEEE_FLOAT = 3;
    private static final int FORMAT_EXTENSIBLE = 0xFFFE;
    /** Below this peak level (−120 dBFS, under the dither of a 16-bit file) a file counts as silent. */
    private static final double SILENCE_PEAK = 1e-6;

    private WavReader() {
    }

    /**
     * @param bytes the whole file
     * @return the recording mixed to mono, full scale = 1.0
     * @throws UnreadableInputException when the bytes are not a supported, complete, non-silent WAV
     */
    public static MonoRecording read(byte[] bytes) {
        if (bytes == null || bytes.length == 0) {
            throw new UnreadableInputException("the file is empty");
        }
        if (bytes.length < 12 || !ascii(bytes, 0, "RIFF") || !ascii(bytes, 8, "WAVE")) {
            throw new UnreadableInputException("not a WAV file (no RIFF/WAVE header)");
        }
        ByteBuffer buf = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
        Format format = null;
        int pos = 12;
        while (pos + 8 <= bytes.length) {
            String id = new String(bytes, pos, 4, java.nio.charset.StandardCharsets.US_ASCII);
            long size = Integer.toUnsignedLong(buf.getInt(pos + 4));
            int body = pos + 8;
            if ("fmt ".equals(id)) {
                if (size < 16 || body + size > bytes.length) {
                    throw new UnreadableInputException("the WAV file is truncated inside its format chunk");
                }
                format = Format.parse(buf, body, (int) size);
            } else if ("data".equals(id)) {
                if (format == null) {
                    throw new UnreadableInputException("the WAV file has its data before its format chunk");
                }
                if (size == 0) {
                    throw new UnreadableInputException("the WAV file holds no samples");
                }
                if (body + size > bytes.length) {
                    throw new UnreadableInputException("the WAV file is truncated: its data chunk declares "
                            + size + " bytes but only " + (bytes.length - body) + " are present");
                }
                return decode(buf, body, (int) size, format);
            }
            pos = (int) Math.min(Integer.MAX_VALUE, body + size + (size & 1)); // chunks are padded to even length
        }
        throw new UnreadableInputException(format == null
                ? "the WAV file is truncated or has no format chunk"
                : "the WAV file is truncated or has no data chunk");
    }

    private static MonoRecording decode(ByteBuffer buf, int start, int size, Format f) {
        int frameBytes = f.channels * f.bitsPerSample / 8;
        int frames = size / frameBytes;
        if (frames == 0) {
            throw new UnreadableInputException("the WAV file holds no complete sample frame");
        }
        double[] mono = new double[frames];
        double peak = 0;
        int p = start;
        for (int i = 0; i < frames; i++) {
            double sum = 0;
            for (int c = 0; c < f.channels; c++) {
                sum += sample(buf, p, f);
                p += f.bitsPerSample / 8;
            }
            double v = sum / f.channels;
            if (!Double.isFinite(v)) {
                throw new UnreadableInputException("the WAV file holds a sample that is not a finite number (frame " + i + ")");
            }
            mono[i] = v;
            peak = Math.max(peak, Math.abs(v));
        }
        if (peak < SILENCE_PEAK) {
            throw new UnreadableInputException("the recording is silent (peak level below −120 dBFS)");
        }
        return new MonoRecording(f.sampleRate, mono);
    }

    private static double sample(ByteBuffer buf, int p, Format f) {
        if (f.isFloat) {
            return buf.getFloat(p);
        }
        if (f.bitsPerSample == 16) {
            return buf.getShort(p) / 32768.0;
        }
        // 24-bit little-endian two's complement: sign-extend the top byte.
        int v = (buf.get(p) & 0xFF) | (buf.get(p + 1) & 0xFF) << 8 | buf.get(p + 2) << 16;
        return v / 8388608.0;
    }

    private static boolean ascii(byte[] b, int at, String s) {
        for (int i = 0; i < s.length(); i++) {
            if (b[at + i] != s.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    private record Format(int channels, int sampleRate, int bitsPerSample, boolean isFloat) {

        static Format parse(ByteBuffer buf, int at, int size) {
            int tag = buf.getShort(at) & 0xFFFF;
            int channels = buf.getShort(at + 2) & 0xFFFF;
            long rate = Integer.toUnsignedLong(buf.getInt(at + 4));
            int bits = buf.getShort(at + 14) & 0xFFFF;
            if (tag == FORMAT_EXTENSIBLE) {
                if (size < 40) {
                    throw new UnreadableInputException("the WAV file's extensible format chunk is too short");
                }
                tag = buf.getShort(at + 24) & 0xFFFF; // first two bytes of the sub-format GUID
            }
            boolean isFloat;
            if (tag == FORMAT_PCM && (bits == 16 || bits == 24)) {
                isFloat = false;
            } else if (tag == FORMAT_IEEE_FLOAT && bits == 32) {
                isFloat = true;
            } else {
                throw new UnreadableInputException("unsupported WAV encoding (format tag " + tag + ", " + bits
                        + " bits): use PCM 16 or 24 bit, or 32-bit float");
            }
            if (channels != 1 && channels != 2) {
                throw new UnreadableInputException("unsupported WAV with " + channels + " channels: use mono or stereo");
            }
            if (rate < 1000 || rate > 768_000) {
                throw new UnreadableInputException("unsupported WAV sample rate " + rate + " Hz (1 kHz to 768 kHz)");
            }
            return new Format(channels, (int) rate, bits, isFloat);
        }
    }
}
