package org.nodewright.physics.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class CsvReadersTest {

    @Test
    void readsPartialsWithAndWithoutModeNumbers() {
        assertThat(PartialsCsvReader.read("n,frequencyHz\n1,110.0\n2;220.5\n\n# comment\n3\t331.2\n"))
                .containsExactly(new PartialsCsvReader.Row(1, 110.0), new PartialsCsvReader.Row(2, 220.5),
                        new PartialsCsvReader.Row(3, 331.2));
        assertThat(PartialsCsvReader.read("110.0\r\n220.5\r\n")).extracting(PartialsCsvReader.Row::n).containsOnly(0);
    }

    @Test
    void namesTheLineAndColumnOfTextInANumberColumn() {
        assertThatThrownBy(() -> PartialsCsvReader.read("n,frequencyHz\n1,110\n2,abc\n"))
                .isInstanceOf(UnreadableInputException.class)
                .hasMessageContaining("line 3").hasMessageContaining("frequencyHz").hasMessageContaining("abc");
        assertThatThrownBy(() -> PartialsCsvReader.read("1,110\n2.5,220\n")).hasMessageContaining("whole number");
        assertThatThrownBy(() -> PartialsCsvReader.read("1,110\n2,NaN\n")).hasMessageContaining("not a number");
        assertThatThrownBy(() -> PartialsCsvReader.read("1,110\n2\n")).hasMessageContaining("expected 2");
        assertThatThrownBy(() -> PartialsCsvReader.read("  \n")).hasMessageContaining("empty");
    }

    @Test
    void fitsATableOfFrequenciesWithoutModeNumbers() {
        // Frequencies from Fletcher's law (1964, eq. 11) written here, f_n = n f1 sqrt(1 + B n^2), with
        // f1 = 130.81 Hz, B = 2.5e-4, partial 4 absent.
        double f1 = 130.81;
        double b = 2.5e-4;
        StringBuilder csv = new StringBuilder("frequencyHz\n");
        for (int n = 1; n <= 16; n++) {
            if (n != 4) {
                csv.append(n * f1 * Math.sqrt(1 + b * n * n)).append('\n');
            }
        }
        List<SpectralPeak> peaks = PartialsCsvReader.read(csv.toString()).stream()
                .map(r -> new SpectralPeak(r.frequencyHz(), 0)).toList();
        PartialFit fit = PartialAnalyzer.fitPeaks(peaks, null, 40);
        assertThat(fit.f1Hz()).isCloseTo(f1, within(1e-6));
        assertThat(fit.inharmonicityB()).isCloseTo(b, within(1e-9));
        assertThat(fit.partials()).extracting(FittedPartial::n).doesNotContain(4).contains(16);
    }

    @Test
    void readsAnImpedanceCurveInDegreesFromItsHeader() {
        ImpedanceCurve c = ImpedanceCsvReader.read("frequencyHz,magnitude,phaseDeg\n100,1.5,90\n101,2.0,0\n102,1.5,-90\n", null);
        assertThat(c.phaseRad()).containsExactly(Math.PI / 2, 0.0, -Math.PI / 2);
        assertThat(ImpedanceCsvReader.read("100,1.5,1\n101,2.0,0\n102,1.5,-1\n", null).phaseRad()).containsExactly(1.0, 0.0, -1.0);
    }

    @Test
    void refusesABadImpedanceTable() {
        assertThatThrownBy(() -> ImpedanceCsvReader.read("100,1,0\n100,2,0\n101,1,0\n", null)).hasMessageContaining("rise");
        assertThatThrownBy(() -> ImpedanceCsvReader.read("100,1,0\n101,x,0\n102,1,0\n", null))
                .hasMessageContaining("line 2").hasMessageContaining("magnitude");
        assertThatThrownBy(() -> ImpedanceCsvReader.read("100,1\n101,2\n102,1\n", null)).hasMessageContaining("three columns");
        assertThatThrownBy(() -> ImpedanceCsvReader.read("100,0,0\n101,2,0\n102,1,0\n", null)).hasMessageContaining("positive");
    }
}
