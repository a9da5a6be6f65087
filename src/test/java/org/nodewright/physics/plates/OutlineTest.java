package org.nodewright.physics.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class OutlineTest {

    @Test
    void refusesSelfCrossingAndTooShortOutlines() {
        assertThat(Outline.problem(new double[] {0, 2, 2, 1, 0}, new double[] {0, 0, 2, -1, 1})).get().asString()
                .contains("crosses itself");
        assertThat(Outline.problem(new double[] {0, 1}, new double[] {0, 1})).get().asString().contains("at least 3");
        assertThat(Outline.problem(new double[] {0, 1, 2}, new double[] {0, 1, 2})).get().asString().contains("no area");
        assertThatThrownBy(() -> Outline.polygon(new double[] {0, 1, 0, 1}, new double[] {0, 1, 1, 0}))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void keepsClockwiseOutlinesCounterClockwiseAndMirrorsHalves() {
        Outline cw = Outline.polygon(new double[] {0, 0, 1, 1}, new double[] {0, 1, 1, 0});
        assertThat(cw.area()).isEqualTo(1.0);
        Outline full = Outline.mirroredHalf(new double[] {0, 0, 2, 2}, new double[] {0, 1, 1, 0});
        assertThat(full.size()).isEqualTo(6);
        assertThat(full.area()).isEqualTo(4.0);
        assertThat(full.contains(1, -0.5)).isTrue();
    }

    @Test
    void indefiniteStiffnessIsRefused() {
        // 1 − nu_xy nu_yx > 0 (Lekhnitskii): nu_xy = 4 with E_y/E_x = 0.1 gives 1.6
        assertThatThrownBy(() -> new PlateMaterial(450, 10e9, 1e9, 0.7e9, 4)).hasMessageContaining("positive definite");
    }
}
