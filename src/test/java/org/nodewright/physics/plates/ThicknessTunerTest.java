package org.nodewright.physics.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.inverse.SolveCancelledException;
import org.nodewright.physics.inverse.SolveProgress;

class ThicknessTunerTest {

    private static final PlateMaterial ALU = PlateMaterial.isotropic(2700, 69e9, 0.33);

    /**
     * Exact lowest mode of a simply supported isotropic rectangle (Leissa 1969, NASA SP-160, eq. 4.20 with m = n = 1):
     * f11 = (π/2)(1/a² + 1/b²) √(D/(ρh)), D = E h³/(12(1 − ν²)), so f11 = (π/2)(1/a² + 1/b²) · h · √(E/(12 ρ (1 − ν²)))
     * and the thickness for a target is that line solved for h.
     */
    private static double exactThickness(double a, double b, double targetHz) {
        return targetHz / (Math.PI / 2 * (1 / (a * a) + 1 / (b * b)) * Math.sqrt(69e9 / (12 * 2700 * (1 - 0.33 * 0.33))));
    }

    // Rectangles and targets of our own; the answer from Leissa's closed form above. Tolerance: 2e-5 of h (the
    // solve stops at 0.01 cent, 6e-6 of f, and the Ritz basis is converged far beyond that).
    @ParameterizedTest(name = "{0} x {1} m to {2} Hz from {3} mm")
    @CsvSource({
        "0.40, 0.30, 120.0, 3.0",
        "0.25, 0.25, 410.0, 1.2",
        "0.60, 0.20, 95.0,  5.0",
    })
    void uniformThicknessOfASupportedPlateMeetsLeissasClosedForm(double a, double b, double targetHz, double startMm) {
        Plate plate = new Plate(Outline.rectangle(a, b), ALU, ThicknessField.uniform(startMm * 1e-3),
                EdgeCondition.SIMPLY_SUPPORTED, List.of());
        ThicknessTuner.Solution s = new ThicknessTuner(0.01, 60).solve(plate,
                List.of(new ThicknessTuner.Target(1, targetHz)),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, 0.5e-3, 10e-3)), 6,
                SolveProgress.NONE, () -> false);
        double h = exactThickness(a, b, targetHz);
        assertThat(s.converged()).isTrue();
        assertThat(s.values()[0]).isCloseTo(h, within(2e-5 * h));
        assertThat(Math.abs(s.cents()[0])).isLessThan(0.01);
        // f ∝ h (closed form above): removing 0.1 mm moves the mode by −f · 0.1 mm / h, the same for the whole plate.
        double expected = -targetHz * 1e-4 / h;
        assertThat(s.hzPerTenthMm()[0][0]).isCloseTo(expected, within(1e-3 * Math.abs(expected)));
        assertThat(s.hzPerTenthMm()[0][1]).isCloseTo(expected, within(1e-3 * Math.abs(expected)));
        assertThat(s.evaluations()).isLessThanOrEqualTo(30);
    }

    /**
     * A graduated free plate (300 x 200 mm, spruce-like E_x 12 GPa, E_y 0.90 GPa, G 0.70 GPa, nu 0.37, 430 kg/m³;
     * Shepard thickness through four control points): modes 1 and 2 of the plate whose centre point is 3.4 mm and
     * whose point at (150, 30) mm is 2.5 mm, computed by the independent numpy/scipy Rayleigh-Ritz model
     * src/test/python/graduated_plate_ritz.py (Legendre 14 x 14, 48 x 48 Gauss points, scipy.linalg.eigh):
     * 65.183717 Hz and 108.384236 Hz. From 3.0 mm at both, the solver must find 3.4 and 2.5 mm again.
     */
    @Test
    void twoControlPointsAreFoundAgainFromTwoModesOfAnIndependentModel() {
        List<ThicknessPoint> start = List.of(new ThicknessPoint(0.150, 0.100, 0.0030),
                new ThicknessPoint(0.150, 0.030, 0.0030), new ThicknessPoint(0.040, 0.100, 0.0027),
                new ThicknessPoint(0.260, 0.100, 0.0027));
        Plate plate = new Plate(Outline.rectangle(0.300, 0.200), new PlateMaterial(430, 12.0e9, 0.90e9, 0.70e9, 0.37),
                ThicknessField.graduated(start), EdgeCondition.FREE, List.of());
        int[] reported = {0};
        ThicknessTuner.Solution s = new ThicknessTuner(0.5, 120).solve(plate,
                List.of(new ThicknessTuner.Target(1, 65.183717), new ThicknessTuner.Target(2, 108.384236)),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS_POINT, 0, 1.5e-3, 5e-3),
                        new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS_POINT, 1, 1.5e-3, 5e-3)),
                6, (e, m, w) -> reported[0] = e, () -> false);
        assertThat(s.converged()).isTrue();
        assertThat(s.values()[0]).isCloseTo(3.4e-3, within(0.03e-3));
        assertThat(s.values()[1]).isCloseTo(2.5e-3, within(0.03e-3));
        assertThat(s.plate().thickness().controlPoints().get(2).thicknessM()).isEqualTo(0.0027);
        assertThat(reported[0]).isEqualTo(s.evaluations());
        // Thinning the whole plate by 0.1 mm lowers both modes (f grows with thickness for a free plate)
        assertThat(s.hzPerTenthMm()[0][2]).isNegative();
        assertThat(s.hzPerTenthMm()[1][2]).isNegative();
    }

    @Test
    void aTargetBeyondTheLimitsEndsAtTheLimitUnconverged() {
        Plate plate = new Plate(Outline.rectangle(0.4, 0.3), ALU, ThicknessField.uniform(3e-3),
                EdgeCondition.SIMPLY_SUPPORTED, List.of());
        double needs = exactThickness(0.4, 0.3, 400.0);
        assertThat(needs).isGreaterThan(6e-3);
        ThicknessTuner.Solution s = new ThicknessTuner(0.5, 40).solve(plate,
                List.of(new ThicknessTuner.Target(1, 400.0)),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, 1e-3, 6e-3)), 4,
                SolveProgress.NONE, () -> false);
        assertThat(s.converged()).isFalse();
        assertThat(s.values()[0]).isCloseTo(6e-3, within(1e-9));
        assertThat(s.cents()[0]).isNegative();
    }

    @Test
    void aCancelledSolveStops() {
        Plate plate = new Plate(Outline.rectangle(0.4, 0.3), ALU, ThicknessField.uniform(3e-3),
                EdgeCondition.FREE, List.of());
        assertThatThrownBy(() -> new ThicknessTuner(0.5, 40).solve(plate, List.of(new ThicknessTuner.Target(1, 50)),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, 1e-3, 6e-3)), 4,
                SolveProgress.NONE, () -> true)).isInstanceOf(SolveCancelledException.class);
    }

    @Test
    void unknownsThatDoNotFitThePlateAreRefused() {
        Plate plate = new Plate(Outline.rectangle(0.4, 0.3), ALU, ThicknessField.uniform(3e-3),
                EdgeCondition.FREE, List.of());
        ThicknessTuner tuner = new ThicknessTuner(0.5, 40);
        assertThatThrownBy(() -> tuner.solve(plate, List.of(new ThicknessTuner.Target(1, 50)),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.BRACE_HEIGHT, 0, 1e-3, 6e-3)), 4,
                SolveProgress.NONE, () -> false)).hasMessageContaining("no brace 0");
        assertThatThrownBy(() -> tuner.solve(plate, List.of(new ThicknessTuner.Target(1, 50)),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, 4e-3, 6e-3)), 4,
                SolveProgress.NONE, () -> false)).hasMessageContaining("outside its limits");
    }

    /**
     * A cross-grain brace on the spruce test plate stiffens its cross-grain bending mode (0, 2) past two others: the
     * mode that is the second at a 1 mm brace is the fourth at 6 mm. The target follows that mode by its shape, so
     * the solved plate's mode at the target is still the one with no node line across x and two across y.
     */
    @Test
    void aTargetFollowsItsModeByShapeWhenModesSwapOrder() {
        PlateMaterial spruce = PlateMaterials.byId("spruce").orElseThrow().material();
        Plate plate = new Plate(Outline.rectangle(0.4, 0.3), spruce, ThicknessField.uniform(0.003), EdgeCondition.FREE,
                List.of(new Brace(0.2, 0.02, 0.2, 0.28, 0.008, 0.001)));
        PlateMode before = new PlateSolver().analyze(plate, 6).modes().get(1);
        assertThat(new int[] {before.nodalLinesX(), before.nodalLinesY()}).containsExactly(0, 2);
        ThicknessTuner.Solution s = new ThicknessTuner(0.5, 80).solve(plate,
                List.of(new ThicknessTuner.Target(2, 1.8 * before.frequencyHz())),
                List.of(new ThicknessTuner.Unknown(ThicknessTuner.Kind.BRACE_HEIGHT, 0, 0.0005, 0.015)), 6,
                SolveProgress.NONE, () -> false);
        assertThat(s.converged()).isTrue();
        assertThat(s.modesNow()[0]).isGreaterThan(2);
        PlateMode after = new PlateSolver().analyze(s.plate(), 6).modes().get(s.modesNow()[0] - 1);
        assertThat(new int[] {after.nodalLinesX(), after.nodalLinesY()}).containsExactly(0, 2);
        assertThat(after.frequencyHz()).isCloseTo(1.8 * before.frequencyHz(), within(0.01 * before.frequencyHz()));
    }

    // The modal assurance criterion (Allemang & Brown 1982), (a·b)² / ((a·a)(b·b)), written out on small grids:
    // a shape against itself scaled by -2 is 1; sin(πx) against cos(πx) sampled symmetrically on [0, 1] is 0; NaN
    // nodes (outside an outline) are left out of both.
    @Test
    void macIsOneForTheSameShapeAndZeroForOrthogonalOnes() {
        double[][] a = new double[9][3];
        double[][] b = new double[9][3];
        double[][] c = new double[9][3];
        for (int i = 0; i < 9; i++) {
            for (int j = 0; j < 3; j++) {
                double x = i / 8.0;
                a[i][j] = Math.sin(Math.PI * x);
                b[i][j] = -2 * a[i][j];
                c[i][j] = Math.cos(Math.PI * x);
            }
        }
        a[4][1] = Double.NaN;
        assertThat(ThicknessTuner.mac(a, b)).isCloseTo(1.0, within(1e-12));
        assertThat(ThicknessTuner.mac(b, c)).isCloseTo(0.0, within(1e-12));
    }
}
