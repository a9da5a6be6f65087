package org.nodewright.physics.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

class WavReaderTest {

    // Layout: RIFF/WAVE (Microsoft/IBM Multimedia Programming Interface and Data Specifications 1.0,
    // 1991): PCM tag 1, IEEE float tag 3; 16-bit full scale 32768, 24-bit full scale 8388608.
    @ParameterizedTest(name = "tag {0}, {1} bits, {2} channel(s)")
    @CsvSource({"1, 16, 1", "1, 16, 2", "1, 24, 1", "1, 24, 2", "3, 32, 1", "3, 32, 2"})
    void readsEachSupportedEncodingAndMixesStereoToMono(int tag, int bits, int channels) {
        double[] x = {0.5, -0.25, 0.125, -1.0, 0.0};
        MonoRecording r = WavReader.read(SyntheticPluck.wav(x, channels, tag, bits, 44_100));
        assertThat(r.sampleRateHz()).isEqualTo(44_100);
        assertThat(r.length()).isEqualTo(5);
        // Second channel is written at half the first: the mix is 0.75 of the signal.
        double gain = channels == 2 ? 0.75 : 1.0;
        double lsb = bits == 16 ? 1 / 32768.0 : 1 / 8388608.0;
        for (int i = 0; i < x.length; i++) {
            assertThat(r.sample(i)).isCloseTo(gain * x[i], within(lsb));
        }
    }

    @Test
    void readsTheExtensibleFormatAndSkipsUnknownChunks() {
        byte[] plain = SyntheticPluck.wav(new double[] {0.5, -0.5, 0.25}, 1, 1, 24, 48_000);
        // fmt chunk of 40 bytes with tag 0xFFFE and the PCM sub-format GUID, plus a LIST chunk before data.
        ByteBuffer b = ByteBuffer.allocate(12 + 48 + 14 + 8 + 9).order(ByteOrder.LITTLE_ENDIAN);
        b.put("RIFF".getBytes()).putInt(b.capacity() - 8).put("WAVE".getBytes());
        b.put("fmt ".getBytes()).putInt(40).putShort((short) 0xFFFE).putShort((short) 1).putInt(48_000)
                .putInt(48_000 * 3).putShort((short) 3).putShort((short) 24).putShort((short) 22)
                .putShort((short) 24).putInt(0).putShort((short) 1).put(new byte[14]);
        b.put("LIST".getBytes()).putInt(5).put(new byte[] {1, 2, 3, 4, 5}).put((byte) 0);
        b.put("data".getBytes()).putInt(9).put(Arrays.copyOfRange(plain, 44, 53));
        MonoRecording r = WavReader.read(b.array());
        assertThat(r.length()).isEqualTo(3);
        assertThat(r.sample(0)).isCloseTo(0.5, within(1e-6));
        assertThat(r.sample(1)).isCloseTo(-0.5, within(1e-6));
    }

    @Test
    void refusesAnEmptyFile() {
        assertThatThrownBy(() -> WavReader.read(new byte[0])).hasMessageContaining("empty");
    }

    @Test
    void refusesAFileThatIsNotAWav() {
        assertThatThrownBy(() -> WavReader.read("n,frequencyHz\n1,110\n".getBytes())).hasMessageContaining("not a WAV");
    }

    @Test
    void refusesATruncatedFile() {
        byte[] whole = SyntheticPluck.wav(new double[1000], 1, 1, 16, 48_000);
        whole[44] = 100;
        assertThatThrownBy(() -> WavReader.read(Arrays.copyOf(whole, 1000))).hasMessageContaining("truncated");
        assertThatThrownBy(() -> WavReader.read(Arrays.copyOf(whole, 30))).hasMessageContaining("truncated");
    }

    @Test
    void refusesASilentFile() {
        assertThatThrownBy(() -> WavReader.read(SyntheticPluck.wav(new double[48_000], 1, 1, 16, 48_000)))
                .hasMessageContaining("silent");
    }

    @Test
    void refusesUnsupportedEncodingsNamingThem() {
        byte[] eightBit = SyntheticPluck.wav(new double[] {0.5, 0.5}, 1, 1, 16, 48_000);
        ByteBuffer.wrap(eightBit).order(ByteOrder.LITTLE_ENDIAN).putShort(34, (short) 8);
        assertThatThrownBy(() -> WavReader.read(eightBit)).hasMessageContaining("8 bits");
        byte[] threeChannels = SyntheticPluck.wav(new double[] {0.5, 0.5, 0.5}, 1, 1, 16, 48_000);
        ByteBuffer.wrap(threeChannels).order(ByteOrder.LITTLE_ENDIAN).putShort(22, (short) 3);
        assertThatThrownBy(() -> WavReader.read(threeChannels)).hasMessageContaining("3 channels");
    }

    @Test
    void aSynthesisedRecordingSurvivesEveryEncodingWithTheSameFit() {
        SyntheticPluck s = new SyntheticPluck().f1(220.0).b(2e-4).seconds(1.5);
        for (byte[] wav : new byte[][] {s.wav16(1), s.wav24(2), s.wavFloat(2)}) {
            PartialFit fit = PartialAnalyzer.analyze(WavReader.read(wav), null, 30);
            assertThat(Cents.between(fit.f1Hz(), 220.0)).isCloseTo(0.0, within(0.1));
            assertThat(fit.inharmonicityB()).isCloseTo(2e-4, within(0.02 * 2e-4));
        }
    }
}
