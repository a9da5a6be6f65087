package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

/** The air inside while playing: composition, humidity and a temperature gradient along the bore. */
class BreathTest {

    static final AirProperties ROOM = AirProperties.at(20, 50);
    static final List<BoreSegment> BORE = List.of(new BoreSegment(0.40, 0.0075, 0.0075));

    static AirColumn bore(Breath breath, boolean losses, OutputEnd out) {
        return new AirColumn(BORE, List.of(new ToneHole(0.3, 0.003, 0.003, true)), InputEnd.CLOSED, out, ROOM,
                losses, null, breath);
    }

    static List<Resonance> resonances(AirColumn c) {
        return AirColumnAnalyzer.detect(new TransferMatrixSolver(c), 50, 3000, 6);
    }

    @Test
    void breathOfRoomAirEqualsTheRoom() {
        // 400 ppm CO2, the room's humidity and temperature at both ends: the same bore as without a
        // breath (the check; common sense), to 1e-12 relative.
        List<Resonance> room = resonances(bore(null, true, OutputEnd.OPEN_UNFLANGED));
        List<Resonance> breath = resonances(bore(new Breath(0.0004, 50, 20, 20), true, OutputEnd.OPEN_UNFLANGED));
        assertThat(breath).hasSameSizeAs(room);
        for (int i = 0; i < room.size(); i++) {
            assertThat(breath.get(i).frequencyHz()).isCloseTo(room.get(i).frequencyHz(),
                    offset(room.get(i).frequencyHz() * 1e-12));
        }
    }

    /**
     * An independent ideal-gas mixture written here: c = sqrt(gamma R T / M), dry air N2/O2/Ar with
     * CO2 taking O2's place, water vapour from Buck's saturation formula (A. L. Buck, J. Appl.
     * Meteorol. 20, 1527 (1981): e_s = 611.21 exp((18.678 - t/234.5) t/(257.14 + t)) Pa), molar
     * heat capacities at 300 K from the NIST-JANAF tables (Chase 1998; from memory: N2 29.12,
     * O2 29.39, Ar 20.79, CO2 37.22, H2O 33.60 J/(mol K)).
     */
    static double idealSpeed(double tC, double rhPct, double xc) {
        double xw = rhPct / 100 * 611.21 * Math.exp((18.678 - tC / 234.5) * tC / (257.14 + tC)) / 101325.0;
        double dry = 1 - xw;
        double xcd = xc / dry;
        double n2 = 0.78084 * dry;
        double ar = 0.00934 * dry;
        double o2 = (0.20986 - xcd) * dry;
        double co2 = xcd * dry;
        double sum = n2 + ar + o2 + co2 + xw;
        double cp = (n2 * 29.12 + o2 * 29.39 + ar * 20.79 + co2 * 37.22 + xw * 33.60) / sum;
        double m = (n2 * 28.0134 + o2 * 31.9988 + ar * 39.948 + co2 * 44.0095 + xw * 18.01528) / sum * 1e-3;
        double gamma = cp / (cp - 8.314462618);
        return Math.sqrt(gamma * 8.314462618 * (tC + 273.15) / m);
    }

    // The pitch shift of breath against the room, lossless and with p = 0 at the far end so that
    // every resonance scales with c: against the independent ideal-gas mixture above. Tolerance
    // 1.5 cents (the "breath within 1-2 cents"; real-gas and heat-capacity differences
    // between the two models are about 0.5 cent).
    @ParameterizedTest
    @CsvSource({
        // co2 fraction, RH %, temperature C
        "0.04, 90, 32",
        "0.01, 100, 30",
        "0.06, 95, 35",
        "0.0004, 50, 20",
    })
    void uniformBreathShiftsPitchAsTheSpeedOfSound(double xc, double rh, double t) {
        List<Resonance> room = resonances(bore(null, false, OutputEnd.IDEAL_OPEN));
        List<Resonance> breath = resonances(bore(new Breath(xc, rh, t, t), false, OutputEnd.IDEAL_OPEN));
        double expected = Cents.between(idealSpeed(t, rh, xc), idealSpeed(20, 50, 0.0004));
        for (int i = 0; i < 4; i++) {
            assertThat(Cents.between(breath.get(i).frequencyHz(), room.get(i).frequencyHz())).as("resonance %d", i)
                    .isCloseTo(expected, offset(1.5));
        }
    }

    // Within Cramer's range (up to 1 % CO2) the CO2 dependence alone, against the independent
    // mixture: c(1 %)/c(0.04 %) in cents. Tolerance 0.2 cent (the two agree on dc/dxc to about 1 %
    // of the 4.3-cent effect).
    @Test
    void co2WithinCramersRangeAgreesWithTheIdealMixture() {
        double cramer = Cents.between(AirProperties.of(20, 0, 0.01).speedOfSound(),
                AirProperties.of(20, 0, 0.0004).speedOfSound());
        double ideal = Cents.between(idealSpeed(20, 0, 0.01), idealSpeed(20, 0, 0.0004));
        assertThat(cramer).isCloseTo(ideal, offset(0.2)).isLessThan(-3.5);
    }

    @Test
    void theMixtureJoinsCramerAtOnePercent() {
        // No step where the model changes (1 % CO2): within 0.001 cent of the limit from below.
        double below = AirProperties.of(30, 90, 0.01 - 1e-9).speedOfSound();
        double above = AirProperties.of(30, 90, 0.01 + 1e-9).speedOfSound();
        assertThat(Math.abs(Cents.between(above, below))).isLessThan(0.001);
    }

    // A linear temperature fall along an open-open lossless cylinder (p = 0 at both ends): the
    // resonances of a slowly varying medium follow the travel time, f_n = n / (2 integral dx/c)
    // (the WKB limit; common practice). The bare open input is p = 0 at impedance minima. Tolerance
    // 0.2 cent.
    @Test
    void temperatureGradientFollowsTheTravelTime() {
        Breath b = new Breath(0.04, 90, 34, 22);
        AirColumn col = new AirColumn(List.of(new BoreSegment(0.6, 0.008, 0.008)), List.of(), InputEnd.OPEN,
                OutputEnd.IDEAL_OPEN, ROOM, false, null, b);
        List<Resonance> r = AirColumnAnalyzer.detect(new TransferMatrixSolver(col), 100, 2000, 4);
        int n = 2000;
        double travel = 0;
        for (int i = 0; i < n; i++) {
            travel += 0.6 / n / b.airAt((i + 0.5) / n).speedOfSound();
        }
        for (int m = 1; m <= 4; m++) {
            assertThat(Cents.between(r.get(m - 1).frequencyHz(), m / (2 * travel))).as("n = %d", m)
                    .isCloseTo(0, offset(0.2));
        }
    }
}
