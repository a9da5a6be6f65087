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
        var target = new GaugePicker.Target(0.65, 110.0, 80.0, Materials.get("nickel-plated-steel"),
                Materials.get("nickel-plated-steel"), 0.4);
        List<Double> gauges = List.of(0.030 * INCH, 0.036 * INCH, 0.042 * INCH, 0.046 * INCH, 0.052 * INCH);
        var pick = GaugePicker.pick(target, gauges);
        double best = gauges.stream().mapToDouble(d -> Math.abs(Math.log(target.tensionAt(d) / 80.0))).min().orElseThrow();
        assertThat(Math.abs(Math.log(pick.choice().tensionN() / 80.0))).isEqualTo(best);
        assertThat(pick.thinner().outerDiameterM()).isLessThan(pick.choice().outerDiameterM());
        assertThat(pick.thicker().outerDiameterM()).isGreaterThan(pick.choice().outerDiameterM());
        assertThat(pick.thinner().tensionN()).isLessThan(pick.choice().tensionN());
    }
}
