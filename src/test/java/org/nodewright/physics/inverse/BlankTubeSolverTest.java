package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class BlankTubeSolverTest {

    @Test
    void theFirstLayoutIsPutInsideTheLimitsInOrderWithItsWalls() {
        SolverLimits limits = new SolverLimits(40, 10, 3, 4, 9, true, true, 200, 280);
        HoleLayout crowded = new HoleLayout(new double[] {20, 150, 152, 275}, new double[] {3, 6, 6, 12}, 300);
        HoleLayout l = BlankTubeSolver.within(crowded, 0, limits);
        assertThat(l.footLengthMm()).isEqualTo(280);
        assertThat(l.diametersMm()).containsExactly(4, 6, 6, 9);
        assertThat(l.position(0)).isEqualTo(40);
        assertThat(l.position(3)).isEqualTo(270);
        for (int i = 0; i + 1 < 4; i++) {
            double wall = l.position(i + 1) - l.position(i) - (l.diameter(i) + l.diameter(i + 1)) / 2;
            assertThat(wall).isGreaterThanOrEqualTo(3 - 1e-9);
        }
    }
}
