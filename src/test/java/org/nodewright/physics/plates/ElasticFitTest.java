package org.nodewright.physics.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.EnumMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ElasticFitTest {

    private static final PlateMaterial SPRUCE_START = PlateMaterials.byId("spruce").orElseThrow().material();

    /**
     * Round trip: the three modes of free orthotropic plates computed by the independent numpy/scipy Rayleigh-Ritz
     * model src/test/python/free_plate_ritz.py (Legendre 18 x 18, scipy.linalg.eigh; converged to 1e-6 between
     * 14 and 22 terms). From the catalogue spruce the fit must find the plate's constants again within 0.3 %.
     */
    @ParameterizedTest(name = "{0} x {1} x {2} m")
    @CsvSource({
        // a, b, h, rho, E along, E across, G, nu, f twisting, f along, f across (Hz, numpy)
        "0.300, 0.120, 0.0030, 430.0, 12.0e9, 0.90e9, 0.70e9, 0.37, 112.382184, 180.941927, 311.315444",
        "0.250, 0.200, 0.0025, 380.0, 9.5e9,  0.75e9, 0.62e9, 0.30, 67.126554,  206.177620, 90.272485",
    })
    void constantsOfAnIndependentlyComputedPlateAreFoundAgain(double a, double b, double h, double rho, double ex,
            double ey, double g, double nu, double fTwist, double fAlong, double fAcross) {
        Map<ElasticFit.Kind, Double> measured = new EnumMap<>(ElasticFit.Kind.class);
        measured.put(ElasticFit.Kind.TWISTING, fTwist);
        measured.put(ElasticFit.Kind.ALONG, fAlong);
        measured.put(ElasticFit.Kind.ACROSS, fAcross);
        ElasticFit.Result r = new ElasticFit().fit(a, b, h, rho, nu, SPRUCE_START, measured);
        assertThat(r.material().elasticAlongPa()).isCloseTo(ex, within(0.003 * ex));
        assertThat(r.material().elasticAcrossPa()).isCloseTo(ey, within(0.003 * ey));
        assertThat(r.material().shearPa()).isCloseTo(g, within(0.003 * g));
        assertThat(r.material().densityKgPerM3()).isEqualTo(rho);
        r.cents().values().forEach(c -> assertThat(Math.abs(c)).isLessThan(0.5));
        r.shapeMatch().values().forEach(m -> assertThat(m).isGreaterThan(ElasticFit.MIXED_BELOW));
        // Rayleigh's principle: the w = xy trial overestimates the twisting frequency, so its G is below the true one
        assertThat(r.closedForm().shearPa()).isLessThan(g).isGreaterThan(0.85 * g);
    }

    /** Only the twisting mode measured: G is fitted, the two moduli stay at the start's. */
    @Test
    void oneModeFitsOneConstant() {
        Map<ElasticFit.Kind, Double> measured = new EnumMap<>(ElasticFit.Kind.class);
        measured.put(ElasticFit.Kind.TWISTING, 112.382184);
        ElasticFit.Result r = new ElasticFit().fit(0.300, 0.120, 0.0030, 430.0, 0.37,
                new PlateMaterial(430, 12.0e9, 0.90e9, 0.40e9, 0.37), measured);
        assertThat(r.material().shearPa()).isCloseTo(0.70e9, within(0.003 * 0.70e9));
        assertThat(r.material().elasticAlongPa()).isEqualTo(12.0e9);
        assertThat(r.material().elasticAcrossPa()).isEqualTo(0.90e9);
    }

    /**
     * Peaks of a tap recording come without names: among the independent model's lowest six modes of the first plate
     * above (112.38, 180.94, 290.81, 311.32, 382.93, 501.53 Hz, free_plate_ritz.py), starting from the catalogue
     * spruce, the twisting, long-grain and cross-grain modes are the first, second and fourth.
     */
    @Test
    void unnamedPeaksAreMatchedToTheModesTheStartPredicts() {
        double[] peaks = {112.3822, 180.9419, 290.8057, 311.3154, 382.9323, 501.527};
        Map<ElasticFit.Kind, Integer> pick = new ElasticFit().assignPeaks(0.300, 0.120, 0.0030,
                new PlateMaterial(430, SPRUCE_START.elasticAlongPa(), SPRUCE_START.elasticAcrossPa(),
                        SPRUCE_START.shearPa(), SPRUCE_START.poissonAlongAcross()), peaks);
        assertThat(pick).containsEntry(ElasticFit.Kind.TWISTING, 0).containsEntry(ElasticFit.Kind.ALONG, 1)
                .containsEntry(ElasticFit.Kind.ACROSS, 3);
    }

    // The free-free beam root βL of cos x cosh x = 1: scipy.optimize.brentq(lambda x: cos(x)*cosh(x)-1, 4, 5)
    // = 4.730040744862704 (Blevins Table 8-1: 4.73004074). E from the strip relation written out here:
    // E = 12 ρ (2πf)² L⁴ / (βL⁴ h²).
    @ParameterizedTest
    @CsvSource({
        "180.0, 0.300, 0.0030, 430.0",
        "55.0,  0.500, 0.0040, 700.0",
    })
    void beamRelationUsesTheFreeFreeRoot(double f, double length, double h, double rho) {
        double beta = 4.730040744862704;
        double expected = 12 * rho * Math.pow(2 * Math.PI * f, 2) * Math.pow(length, 4) / (Math.pow(beta, 4) * h * h);
        assertThat(FreePlateRelations.elasticFromBeamMode(f, length, h, rho)).isCloseTo(expected, within(1e-9 * expected));
        assertThat(FreePlateRelations.FREE_FREE_BETA_L).isCloseTo(4.73004074, within(1e-8));
    }
}
