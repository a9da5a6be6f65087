package org.nodewright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RequireTest {

    @Test
    void acceptedValuesComeBackUnchanged() {
        assertThat(Require.positive("x", 1.5)).isEqualTo(1.5);
        assertThat(Require.nonNegative("x", 0.0)).isEqualTo(0.0);
        assertThat(Require.finite("x", -2.0)).isEqualTo(-2.0);
        assertThat(Require.atLeastOne("n", 1)).isEqualTo(1);
        assertThat(Require.between("n", 5, 1, 5)).isEqualTo(5);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY})
    void positiveRefusesZeroNegativeAndNonFinite(double v) {
        assertThatThrownBy(() -> Require.positive("lengthM", v)).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("lengthM must be positive and finite, got " + v);
    }

    @ParameterizedTest
    @ValueSource(doubles = {-1e-300, Double.NaN, Double.POSITIVE_INFINITY})
    void nonNegativeRefusesNegativeAndNonFinite(double v) {
        assertThatThrownBy(() -> Require.nonNegative("apertureM", v))
                .hasMessage("apertureM must be zero or positive and finite, got " + v);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY})
    void finiteRefusesNanAndInfinity(double v) {
        assertThatThrownBy(() -> Require.finite("x", v)).hasMessage("x must be finite, got " + v);
    }

    @Test
    void integerRangesNameTheBounds() {
        assertThatThrownBy(() -> Require.atLeastOne("n", 0)).hasMessage("n must be at least 1, got 0");
        assertThatThrownBy(() -> Require.between("count", 201, 1, 200))
                .hasMessage("count must be between 1 and 200, got 201");
    }
}
