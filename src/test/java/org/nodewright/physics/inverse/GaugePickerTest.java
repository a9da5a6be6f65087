package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.strings.Materials;

class GaugePickerTest {

    private static final double INCH = 0.0254;
    /** 1 lbf = 4.4482216152605 N (NIST SP 811). */
    private static final double LBF = 4.4482216152605;

    // Plain steel on a 25.5 in scale: tensions of a string maker's published plain-steel chart
    // (from memory, +-0.3 lbf): .010 at E4 16.2 lbf, .013 at B3 15.4 lbf, .017 at G3 16.6 lbf.
    // Asking for those tensions must give back those gauges from the stock list.
    @ParameterizedTest
    @CsvSource({
        "329.63, 16.2, 0.010",
        "246.94, 15.4, 0.013",
        "196.00, 16.6, 0.017"
    })
    void publishedPlainSteelTensionsGiveBackTheirGauges(double hz, double lbf, double gaugeIn) {
        var target = new GaugePicker.Target(25.5 * INCH, hz, lbf * LBF, Materials.get("plain-steel"), null, 0.4);
        var pick = GaugePicker.pick(target, GaugeStock.gaugesM(Materials.get("plain-steel"), false));
        assertThat(pick.choice().outerDiameterM() / INCH).isCloseTo(gaugeIn, within(1e-9));
        assertThat(Math.abs(pick.offFraction())).isLessThan(0.05);
    }

    @Test
    void exactDiameterOfAPlainStringFollowsMersennesLaw() {
        // T = mu (2 L f)^2 with mu = rho pi d^2 / 4 (Mersenne's laws), solved for d by hand:
        // d = sqrt(4 T / (rho pi (2 L f)^2)).
        double rho = Materials.get("plain-steel").densityKgPerM3();
        double l = 0.648;
        double f = 329.63;
        double t = 70.0;
        double expected = Math.sqrt(4 * t / (rho * Math.PI * Math.pow(2 * l * f, 2)));
        var target = new GaugePicker.Target(l, f, t, Materials.get("plain-steel"), null, 0.4);
        assertThat(GaugePicker.exactDiameter(target)).isCloseTo(expected, within(expected * 1e-9));
    }

    @Test
    void theClosestOfAUserListWinsAndItsNeighboursAreReported() {
        // A plain-steel G3 (196 Hz) on 650 mm at 75 N, offered .014/.016/.017/.018/.020 in. Expected
        // tensions written here from Mersenne's law, T = rho (pi d^2 / 4) (2 L f)^2 (not the code's
        // tensionAt): the closest in log-tension is the one the picker must choose.
        double rho = Materials.get("plain-steel").densityKgPerM3();
        double l = 0.650;
        double f = 196.0;
        double wanted = 75.0;
        List<Double> gauges = List.of(0.014 * INCH, 0.016 * INCH, 0.017 * INCH, 0.018 * INCH, 0.020 * INCH);
        java.util.function.DoubleUnaryOperator mersenne = d -> rho * Math.PI * d * d / 4 * Math.pow(2 * l * f, 2);
        int best = 0;
        for (int i = 1; i < gauges.size(); i++) {
            if (Math.abs(Math.log(mersenne.applyAsDouble(gauges.get(i)) / wanted))
                    < Math.abs(Math.log(mersenne.applyAsDouble(gauges.get(best)) / wanted))) {
                best = i;
            }
        }
        assertThat(best).isBetween(1, 3); // the test data has a neighbour on each side
        var target = new GaugePicker.Target(l, f, wanted, Materials.get("plain-steel"), null, 0.4);
        var pick = GaugePicker.pick(target, gauges);
        assertThat(pick.choice().outerDiameterM()).isEqualTo(gauges.get(best));
        double t = mersenne.applyAsDouble(gauges.get(best));
        assertThat(pick.choice().tensionN()).isCloseTo(t, within(t * 1e-9));
        assertThat(pick.offFraction()).isCloseTo(t / wanted - 1, within(1e-9));
        assertThat(pick.thinner().outerDiameterM()).isEqualTo(gauges.get(best - 1));
        assertThat(pick.thicker().outerDiameterM()).isEqualTo(gauges.get(best + 1));
        assertThat(pick.thinner().tensionN()).isLessThan(pick.choice().tensionN());
    }
}
