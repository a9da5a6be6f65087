package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.offset;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.tuning.Cents;

/**
 * The mouth models against the published formulas in their low-frequency limits, each written out
 * here independently of the production code (lossless bores with an ideal-open far end, p = 0,
 * so that the bare bore is exactly Zin = j Zc tan kL).
 */
class MouthTest {

    static final AirProperties AIR = AirProperties.at(20, 0);
    static final double C = AIR.speedOfSound();

    static AirColumn bore(double length, double radius, InputEnd in, Mouth mouth, boolean losses) {
        return new AirColumn(List.of(new BoreSegment(length, radius, radius)), List.of(), in, OutputEnd.IDEAL_OPEN,
                AIR, losses, mouth, null);
    }

    static double lowest(AirColumn col, double fMin, double fMax) {
        return AirColumnAnalyzer.detect(new TransferMatrixSolver(col), fMin, fMax, 1).get(0).frequencyHz();
    }

    /** Root of g in (a, b) by bisection (g(a), g(b) of opposite signs), to 1e-13 relative. */
    static double root(DoubleUnaryOperator g, double a, double b) {
        double ga = g.applyAsDouble(a);
        for (int i = 0; i < 200 && b - a > 1e-13 * b; i++) {
            double m = 0.5 * (a + b);
            double gm = g.applyAsDouble(m);
            if (Math.signum(gm) == Math.signum(ga)) {
                a = m;
                ga = gm;
            } else {
                b = m;
            }
        }
        return 0.5 * (a + b);
    }

    // A volume V at the input of a closed-input bore equals, at low frequency, a closed tube of
    // length V / S added there: the compliance V / (rho c^2) of a short stopped tube (Nederveen 1969,
    // Acoustical Aspects of Woodwind Instruments, the reed's equivalent volume; common practice).
    // Tolerance: 0.2 cent (tan(k V/S) differs from k V/S by (kV/S)^2/3 of the shift, below 0.1 cent
    // up to the third resonance of these bores).
    @ParameterizedTest
    @CsvSource({
        // length m, radius m, volume m^3
        "0.60, 0.0075, 900e-9",
        "0.40, 0.0060, 400e-9",
        "1.20, 0.0070, 1500e-9",
    })
    void reedVolumeIsAClosedTubeOfLengthVOverS(double length, double radius, double volume) {
        double s = Math.PI * radius * radius;
        // Lossless: the tube's extra wall area would otherwise add its own (small) loss shift.
        AirColumn reed = new AirColumn(List.of(new BoreSegment(length, radius, radius)), List.of(), InputEnd.CLOSED,
                OutputEnd.OPEN_UNFLANGED, AIR, false, new Mouth.Reed(volume), null);
        AirColumn tube = new AirColumn(List.of(new BoreSegment(length + volume / s, radius, radius)), List.of(),
                InputEnd.CLOSED, OutputEnd.OPEN_UNFLANGED, AIR, false);
        List<Resonance> a = AirColumnAnalyzer.detect(new TransferMatrixSolver(reed), 40, 1500, 3);
        List<Resonance> b = AirColumnAnalyzer.detect(new TransferMatrixSolver(tube), 40, 1500, 3);
        assertThat(a).hasSize(3);
        for (int i = 0; i < 3; i++) {
            assertThat(Cents.between(a.get(i).frequencyHz(), b.get(i).frequencyHz())).as("resonance %d", i + 1)
                    .isCloseTo(0, offset(0.2));
        }
        // and the volume matters: without it the pitch is sharp by tens of cents / 100 mm of shift
        double bare = lowest(reed.withMouth(null), 40, 1500);
        assertThat(Cents.between(bare, a.get(0).frequencyHz())).isGreaterThan(3);
    }

    // Cup + throat as a Helmholtz resonator: omega0 = c sqrt(S / (V l')) (Kinsler, Frey, Coppens &
    // Sanders, Fundamentals of Acoustics, 4th ed. (2000), §10.8), l' the throat length plus its two
    // step corrections 0.82 a (1 - 1.35 beta + 0.31 beta^3) (Kergomard & Garcia, J. Sound Vib. 114,
    // 465 (1987)), the cup side taken as a hemisphere of volume V. The throat opens into a 40 mm
    // bore 0.1 mm long with p = 0 beyond, so the throat sees (almost) no load. A large cup keeps
    // k l small: the distributed throat (its own compliance and the tan kl of its mass) differs
    // from the lumped formula by about (kl)^2/3, about 1 cent at k l = 0.05; tolerance 1.5 cents.
    @ParameterizedTest
    @CsvSource({
        // cup m^3, throat radius m, throat length m
        "20000e-9, 0.00185, 0.007",
        "40000e-9, 0.00200, 0.005",
        "10000e-9, 0.00150, 0.004",
    })
    void cupAndThroatResonateAtTheHelmholtzFrequency(double volume, double a, double lt) {
        double wide = 0.02;
        // Lossless, as the textbook formula is (the throat's boundary layer adds some 4 % to its
        // inertance at these sizes and lowers the resonance by about 35 cents).
        AirColumn col = new AirColumn(List.of(new BoreSegment(0.0001, wide, wide)), List.of(), InputEnd.CLOSED,
                OutputEnd.IDEAL_OPEN, AIR, false, new Mouth.Cup(volume, a, lt), null);
        double rCup = Math.cbrt(3 * volume / (2 * Math.PI));
        DoubleUnaryOperator step = big -> 0.82 * a * (1 - 1.35 * a / big + 0.31 * Math.pow(a / big, 3));
        double lEff = lt + step.applyAsDouble(rCup) + step.applyAsDouble(wide);
        double expected = C / (2 * Math.PI) * Math.sqrt(Math.PI * a * a / (volume * lEff));
        double got = lowest(col, 50, 3000);
        assertThat(Cents.between(got, expected)).isCloseTo(0, offset(1.5));
        assertThat(new TransferMatrixSolver(col).mouthHelmholtzHz()).isCloseTo(expected, offset(expected * 1e-9));
    }

    // A window (rectangular orifice, wall t) in series at the open input of a lossless bore with
    // p = 0 at the far end: the playing resonance is the zero of X = omega M + Zc tan kL, with the
    // orifice inertance M = rho t' / S_w (Rayleigh's orifice; Fletcher & Rossing, The Physics of
    // Musical Instruments (1998), ch. 17, the mouth correction), t' = t + t_m + t_i + 0.8216 a for the
    // equal-area circle of radius a: matching and inner lengths of Lefebvre & Scavone 2012 (as
    // printed there), outer flanged end 0.8216 a (Norris & Sheng 1989, low ka). Tolerance 0.3 cent
    // (the radiation resistance and the ka-dependence of the outer correction, k a below 0.03).
    @ParameterizedTest
    @CsvSource({
        // bore length m, bore radius m, window length, width, wall (m)
        "1.00, 0.0065, 0.004, 0.008, 0.0015",
        "0.60, 0.0095, 0.006, 0.010, 0.0030",
        "2.00, 0.0200, 0.012, 0.030, 0.0050",
    })
    void windowIsAnOrificeInertanceAtLowFrequency(double length, double r, double wl, double ww, double t) {
        double sw = wl * ww;
        double a = Math.sqrt(sw / Math.PI);
        double d = a / r;
        double tm = a * d * (1 + 0.207 * d * d * d) / 8;
        double ti = a * (0.822 - 0.095 * d - 1.566 * d * d + 2.138 * d * d * d - 1.640 * Math.pow(d, 4)
                + 0.502 * Math.pow(d, 5));
        double tPrime = t + tm + ti + 0.8216 * a;
        double s = Math.PI * r * r;
        // X(k) / (rho c) = k t'/S_w + tan(kL)/S; first zero above kL = pi/2.
        DoubleUnaryOperator x = k -> k * tPrime / sw + Math.tan(k * length) / s;
        double k1 = root(x, Math.PI / (2 * length) * 1.0001, Math.PI / length * 0.99999);
        double expected = k1 * C / (2 * Math.PI);
        double got = lowest(bore(length, r, InputEnd.OPEN, new Mouth.Window(wl, ww, t, 0), false), 20, 2000);
        assertThat(Cents.between(got, expected)).isCloseTo(0, offset(0.3));
    }

    // Embouchure with headspace: the same orifice inertance (open area after the lip, inner length
    // of the full hole) in series with the headspace (a stopped tube, -j Zc cot kh) in parallel
    // with the bore (j Zc tan kL) — the flute head's topology of Nederveen 1969 and Fletcher &
    // Rossing 1998 ch. 16, written out here. Tolerance: 0.3 cent as above.
    @ParameterizedTest
    @CsvSource({
        // bore length, radius, hole diameter, wall, headspace, coverage (m, m, m, m, m, fraction)
        "0.60, 0.0095, 0.010, 0.0045, 0.017, 0.25",
        "0.60, 0.0095, 0.010, 0.0045, 0.000, 0.00",
        "1.00, 0.0095, 0.012, 0.0040, 0.025, 0.50",
    })
    void embouchureWithHeadspaceMatchesTheLumpedTopology(double length, double r, double dh, double t, double h,
            double cover) {
        double bh = dh / 2;
        double sh = Math.PI * bh * bh;
        double open = sh * (1 - cover);
        double ao = Math.sqrt(open / Math.PI);
        double d = bh / r;
        double tm = bh * d * (1 + 0.207 * d * d * d) / 8;
        double ti = bh * (0.822 - 0.095 * d - 1.566 * d * d + 2.138 * d * d * d - 1.640 * Math.pow(d, 4)
                + 0.502 * Math.pow(d, 5));
        double s = Math.PI * r * r;
        // Series reactance (per rho c): k (ti + t + tm)/S_h + k 0.8216 ao / S_open; then the junction
        // admittance Y = S/(j tan kL) ... as reactances: X_junction = 1 / (-cot(kL)/S... ) below.
        DoubleUnaryOperator x = k -> {
            double series = k * (ti + t + tm) / sh + k * 0.8216 * ao / open;
            // bore: Z = j tan(kL)/S -> Y = -j S cot(kL); headspace: Z = -j cot(kh)/S -> Y = j S tan(kh)
            double b = -s / Math.tan(k * length) + (h > 0 ? s * Math.tan(k * h) : 0);
            // Z_junction = 1 / (j b) = -j / b
            return series - 1 / b;
        };
        // bracket the first zero above the bore's own quarter-wave point
        double k1 = root(x, Math.PI / (2 * length) * 1.0001, Math.PI / length * 0.99999);
        double expected = k1 * C / (2 * Math.PI);
        double got = lowest(bore(length, r, InputEnd.OPEN, new Mouth.Embouchure(dh, dh, t, h, cover), false), 20,
                2000);
        assertThat(Cents.between(got, expected)).isCloseTo(0, offset(0.3));
    }

    @Test
    void moreLipCoverageFlattens() {
        double f0 = lowest(bore(0.6, 0.0095, InputEnd.OPEN, new Mouth.Embouchure(0.01, 0.012, 0.0045, 0.017, 0.1),
                true), 50, 2000);
        double f1 = lowest(bore(0.6, 0.0095, InputEnd.OPEN, new Mouth.Embouchure(0.01, 0.012, 0.0045, 0.017, 0.5),
                true), 50, 2000);
        // Covering the hole shrinks its open area and flattens the note (common practice: rolling in).
        assertThat(Cents.between(f1, f0)).isLessThan(-10);
    }

    @Test
    void aMouthMustAgreeWithTheInputEnd() {
        assertThatThrownBy(() -> bore(0.3, 0.007, InputEnd.CLOSED, new Mouth.Window(0.004, 0.008, 0.0015, 0), true))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("input end");
        assertThatThrownBy(() -> new Mouth.Embouchure(0.01, 0.01, 0.004, 0.017, 0.9))
                .hasMessageContaining("lipCoverage");
    }
}
