package org.nodewright.physics.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

class PartialAnalyzerTest {

    // Recordings synthesised from Fletcher's law f_n = n·f1·√(1+B·n²) (Fletcher 1964, eq. 11) with
    // triangular-pluck amplitudes sin(nπp)/n² (Fletcher & Rossing 1998, §2.7), exponential decay and
    // white noise; the fit must give back the f1 and B they were made with: f1 within 0.1 cent and
    // B within 2 % (the acceptance bounds of the measurement feature).
    @ParameterizedTest(name = "f1 {0} Hz, B {1}, {2} s, noise {3}, expected f1 given: {4}")
    @CsvSource({
            // f1 Hz, B, seconds, noise rms, give expected f1
            "82.41,  1e-5, 2.0, 1e-3, false",
            "110.0,  1e-4, 2.0, 1e-3, false",
            "146.83, 5e-5, 1.0, 1e-3, true",
            "196.0,  3e-4, 3.0, 1e-3, false",
            "329.63, 1e-3, 2.0, 1e-3, true",
            "440.0,  1e-3, 1.0, 3e-3, false",
            "55.0,   2e-5, 4.0, 1e-4, false",
            "261.63, 4e-4, 10.0, 1e-3, false",
    })
    void recoversF1AndInharmonicityFromASynthesisedPluck(double f1, double b, double seconds, double noise,
            boolean giveExpected) {
        SyntheticPluck s = new SyntheticPluck().f1(f1).b(b).seconds(seconds).noise(noise).seed((long) (f1 * 100));
        PartialFit fit = PartialAnalyzer.analyze(s.recording(), giveExpected ? f1 * 1.02 : null, 40);
        assertThat(Cents.between(fit.f1Hz(), f1)).isCloseTo(0.0, within(0.1));
        assertThat(fit.inharmonicityB()).isCloseTo(b, within(0.02 * b));
        assertThat(fit.partials()).hasSizeGreaterThanOrEqualTo(15);
        assertThat(fit.partials().get(0).n()).isEqualTo(1);
        assertThat(fit.rmsCents()).isLessThan(1.0);
    }

    // A pluck at one third of the length leaves a node at every third partial: sin(nπ/3) = 0 for
    // n = 3, 6, 9 … (Fletcher & Rossing 1998, §2.7). Those partials must be reported missing, not
    // invented, and the fit must still hold.
    @ParameterizedTest(name = "f1 {0} Hz, B {1}")
    @CsvSource({"98.0, 2e-4", "73.42, 1e-5", "392.0, 8e-4"})
    void fitsWithEveryThirdPartialMissing(double f1, double b) {
        SyntheticPluck s = new SyntheticPluck().f1(f1).b(b).seconds(2.0).pluckAt(1.0 / 3).noise(1e-3);
        PartialFit fit = PartialAnalyzer.analyze(s.recording(), null, 30);
        assertThat(fit.partials()).extracting(FittedPartial::n).noneMatch(n -> n % 3 == 0);
        assertThat(fit.partials()).hasSizeGreaterThanOrEqualTo(12);
        assertThat(Cents.between(fit.f1Hz(), f1)).isCloseTo(0.0, within(0.1));
        assertThat(fit.inharmonicityB()).isCloseTo(b, within(0.02 * b));
    }

    @Test
    void aPluckAtTheMiddleHasOnlyOddPartialsAndIsNotTakenAnOctaveWrong() {
        // sin(nπ/2) = 0 for even n: the series 1, 3, 5 … must not be read as f1 = 2·f1 or f1/2.
        SyntheticPluck s = new SyntheticPluck().f1(196.0).b(3e-4).seconds(2.0).pluckAt(0.5);
        PartialFit fit = PartialAnalyzer.analyze(s.recording(), null, 30);
        assertThat(fit.partials()).extracting(FittedPartial::n).allMatch(n -> n % 2 == 1);
        assertThat(Cents.between(fit.f1Hz(), 196.0)).isCloseTo(0.0, within(0.1));
    }

    // With every partial equally loud the fundamental is rarely among the strongest peaks, and the
    // even partials alone form a stiff series of their own (2·f1, 4·B): the sieve must still pick f1.
    @ParameterizedTest(name = "flat spectrum, f1 {0} Hz, B {1}")
    @CsvSource({"130.81, 1e-5", "261.63, 1e-4", "523.25, 1e-3"})
    void findsTheFundamentalOfAFlatSpectrum(double f1, double b) {
        SyntheticPluck s = new SyntheticPluck().f1(f1).b(b).seconds(3.0).flat().noise(0);
        PartialFit fit = PartialAnalyzer.analyze(s.recording(), null, 40);
        assertThat(Cents.between(fit.f1Hz(), f1)).isCloseTo(0.0, within(0.1));
        assertThat(fit.inharmonicityB()).isCloseTo(b, within(0.02 * b));
    }

    @Test
    void leadingSilenceBeforeThePluckDoesNotMatter() {
        SyntheticPluck s = new SyntheticPluck().f1(110.0).b(1e-4).seconds(2.0).silenceFirst(0.7);
        PartialFit fit = PartialAnalyzer.analyze(s.recording(), null, 30);
        assertThat(Cents.between(fit.f1Hz(), 110.0)).isCloseTo(0.0, within(0.1));
    }

    @Test
    void maxPartialsLimitsTheModeNumbers() {
        SyntheticPluck s = new SyntheticPluck().f1(110.0).b(1e-4).seconds(2.0);
        PartialFit fit = PartialAnalyzer.analyze(s.recording(), null, 8);
        assertThat(fit.partials()).extracting(FittedPartial::n).allMatch(n -> n <= 8);
        assertThat(fit.partials()).hasSize(8);
    }

    @Test
    void noiseAloneIsRefusedWithAMessage() {
        double[] x = new double[48_000];
        java.util.Random r = new java.util.Random(1);
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.1 * r.nextGaussian();
        }
        assertThatThrownBy(() -> PartialAnalyzer.analyze(new MonoRecording(48_000, x), null, 30))
                .isInstanceOf(UnreadableInputException.class)
                .hasMessageContaining("partial");
    }

    @Test
    void aRecordingShorterThanTheAnalysisNeedsIsRefused() {
        MonoRecording r = new MonoRecording(48_000, java.util.Arrays.copyOf(new SyntheticPluck().seconds(0.05).samples(), 2400));
        assertThatThrownBy(() -> PartialAnalyzer.analyze(r, null, 30))
                .isInstanceOf(UnreadableInputException.class)
                .hasMessageContaining("too short");
    }
}
