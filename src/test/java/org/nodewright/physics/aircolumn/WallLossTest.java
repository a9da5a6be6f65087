package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Wall losses checked against values computed outside the project: the exact Zwikker-Kosten Bessel
 * form, F(r) = 2 J1(x) / (x J0(x)) at x = r e^{-j pi/4}, Gamma/(jk) = sqrt((1 + (gamma-1) Ft) / (1 - Fv)),
 * Zc S/(rho c) = 1 / sqrt((1 - Fv)(1 + (gamma-1) Ft)), evaluated with scipy 1.17
 * ({@code scipy.special.jve} for J0, J1 of complex argument, numpy's principal {@code sqrt} and
 * {@code tanh}); the script's formulas are the ones written in this comment.
 */
class WallLossTest {

    @Test
    void expansionCoefficientsMatchKeefe1984() {
        // Keefe, J. Acoust. Soc. Am. 75, 58 (1984), for air at 300 K (gamma 1.402, nu = sqrt(Pr) 0.8410):
        // Gamma = k[1.045/rv + 1.080/rv^2 + 0.750/rv^3 + j(1 + 1.045/rv)],
        // Zc = Z0[1 + 0.369/rv - j(0.369/rv + 1.149/rv^2 + 0.303/rv^3)]  (from memory of the paper).
        KeefeExpansion k = new KeefeExpansion(1.402, 0.8410);
        // Gamma/(jk) = 1 + G  =>  Re Gamma/k = -Im G, Im Gamma/k = 1 + Re G.
        assertThat(-k.propagationCoefficient(1).getImaginary()).isCloseTo(1.045, offset(0.003));
        assertThat(-k.propagationCoefficient(2).getImaginary()).isCloseTo(1.080, offset(0.003));
        assertThat(-k.propagationCoefficient(3).getImaginary()).isCloseTo(0.750, offset(0.003));
        assertThat(k.propagationCoefficient(1).getReal()).isCloseTo(1.045, offset(0.003));
        assertThat(k.characteristicCoefficient(1).getReal()).isCloseTo(0.369, offset(0.003));
        assertThat(-k.characteristicCoefficient(1).getImaginary()).isCloseTo(0.369, offset(0.003));
        assertThat(-k.characteristicCoefficient(2).getImaginary()).isCloseTo(1.149, offset(0.003));
        assertThat(-k.characteristicCoefficient(3).getImaginary()).isCloseTo(0.303, offset(0.003));
    }

    // Exact Zwikker-Kosten Gamma/(jk) and Zc S/(rho c) at gamma = 1.402, nu = 0.8410 (Keefe's 300 K air),
    // computed with scipy (class comment). Bounds: relative error of the loss part (value - 1), the
    // validity stated in KeefeExpansion (its next, fourth-order term scales as 1/rv^4).
    @ParameterizedTest
    @CsvSource({
        "8,    1.12909323311118,  -0.148996049437848,   1.04532608486909, -0.0647057323197441,  6e-4, 3.5e-3",
        "12,   1.08664051192989,  -0.0950259346073386,  1.03054070254523, -0.0389145374355889,  1.5e-4, 1e-3",
        "30,   1.0348086041937,   -0.0360641712423414,  1.01229126757441, -0.0135913945351347,  1e-5, 7e-5",
        "49.5, 1.02110699507238,  -0.0215600239171687,  1.00745408091729, -0.00792812066305723, 3e-6, 2e-5",
        "60,   1.01741492325823,  -0.0177217787178152,  1.00615032929755, -0.00647234479745006, 2e-6, 2e-5",
        "200,  1.0052254335354,   -0.00525261057032664, 1.00184550189726, -0.00187430095538536, 1e-6, 1e-6"})
    void expansionAgreesWithExactZwikkerKosten(double rv, double gRe, double gIm, double zRe, double zIm,
            double tol, double tolZ) {
        KeefeExpansion k = new KeefeExpansion(1.402, 0.8410);
        Complex exactG = new Complex(gRe, gIm);
        Complex exactZ = new Complex(zRe, zIm);
        assertThat(k.propagation(rv).subtract(exactG).norm() / exactG.subtract(1).norm()).isLessThan(tol);
        assertThat(k.characteristic(rv).subtract(exactZ).norm() / exactZ.subtract(1).norm()).isLessThan(tolZ);
    }

    // F(r) = 2 J1(x) / (x J0(x)), x = r e^{-j pi/4}, from scipy.special.jve (class comment); the bound is
    // on the absolute error |F - F_scipy|. The power series (r <= 50) loses digits to cancellation as r
    // grows (terms of size e^{r/sqrt 2} summing to about 1), hence 1e-12 at small r and 1e-11 near 50;
    // Hankel's three terms (r > 50) leave the 1/x^4 term, below 1e-7 (A&S 9.2.5), the bound ZwikkerKosten
    // states. At r = 51 that is 1e-6 of F itself: a wall-loss change of parts in 1e8 of 1 - F.
    @ParameterizedTest
    @CsvSource({
        "0.5,  0.998700328136309,   -0.0311941553305213,  1e-12",
        "2,    0.773776969099682,   -0.344895509224984,   1e-12",
        "5,    0.284055610575998,   -0.241598016937974,   1e-12",
        "10,   0.141625468347904,   -0.131248077776285,   1e-12",
        "30,   0.0471473192945306,  -0.0460228062310972,  1e-12",
        "49,   0.0288630481921135,  -0.0284435066066472,  1e-12",
        "51,   0.0277310480911944,  -0.0273438783844478,  1e-7",
        "100,  0.0141423149280321,  -0.0140419588754843,  1e-7",
        "1000, 0.00141421373940007, -0.00141321338559668, 1e-7"})
    void besselRatioMatchesScipy(double r, double re, double im, double tol) {
        assertThat(ZwikkerKosten.besselRatio(r).subtract(new Complex(re, im)).norm()).isLessThan(tol);
    }

    @Test
    void narrowTubeTendsToPoiseuilleResistance() {
        // Hagen-Poiseuille: series resistance per unit length 8 mu / (pi a^4) in the limit rv -> 0.
        // Zv = j omega rho / (S (1 - Fv)).
        AirProperties air = AirProperties.at(20, 0);
        double a = 5e-5;
        double omega = 2 * Math.PI * 5;
        double rv = a * Math.sqrt(air.density() * omega / air.viscosity());
        assertThat(rv).isLessThan(0.1);
        Complex fv = ZwikkerKosten.besselRatio(rv);
        double s = Math.PI * a * a;
        Complex zv = new Complex(0, omega * air.density() / s).divide(Complex.ONE.subtract(fv));
        double poiseuille = 8 * air.viscosity() / (Math.PI * Math.pow(a, 4));
        assertThat(zv.getReal() / poiseuille).isCloseTo(1.0, offset(1e-4));
    }

    @Test
    void wideTubeLosesNothing() {
        // F -> 0 as rv -> infinity (Zwikker & Kosten 1949): no boundary layer effect.
        assertThat(ZwikkerKosten.besselRatio(1e6).norm()).isLessThan(1e-5);
    }

    // A cylinder of radius 7.5 mm and length 600 mm, closed input, p = 0 at the far end: Zin S/(rho c) =
    // Zc tanh(Gamma L) in the exact Zwikker-Kosten form, computed with scipy (class comment) for the air
    // given here by value (c 343.21 m/s, rho 1.2041 kg/m3, mu 1.8205e-5 Pa s, kappa 0.025873 W/(m K),
    // gamma 1.4014, cp 1006.5 J/(kg K): 20 C dry air, from memory of handbook tables; the figures only
    // need to be the same on both sides). The solver uses Keefe's expansion; 2e-4 relative is its
    // error at rv 26..270 (this tube's range), resonances and anti-resonances included.
    @ParameterizedTest
    @CsvSource({
        "30,   0.0210140199179174, 0.361224605346006",
        "80,   0.0682199796015955, 1.26874622030059",
        "140,  34.238604035846,    5.66339028457121",
        "290,  0.0417636226977645, 0.0844911814664828",
        "430,  8.19012532482973,   -9.92870563493307",
        "570,  0.0574598271997511, 0.0343159705112659",
        "720,  3.55307703464508,   -6.51879459832176",
        "1000, 7.76201923275579,   -6.5379443942219",
        "1440, 0.0945577742495811, 0.200603666374255",
        "2010, 0.111048096763707,  0.193894961161658",
        "2500, 0.198126055657346,  -0.815690406153698",
        "3020, 1.16034566958704,   -2.5996223446751"})
    void lossyCylinderMatchesTheExactZwikkerKostenForm(double f, double re, double im) {
        AirProperties air = new AirProperties(20, 0, 343.21, 1.2041, 1.8205e-5, 0.025873, 1.4014, 1006.5);
        AirColumn col = new AirColumn(List.of(new BoreSegment(0.6, 0.0075, 0.0075)), List.of(), InputEnd.CLOSED,
                OutputEnd.IDEAL_OPEN, air, true);
        double[] gotRe = new double[1];
        double[] gotIm = new double[1];
        new TransferMatrixSolver(col).inputImpedance(f, 0, 1, gotRe, gotIm);
        Complex exact = new Complex(re, im);
        assertThat(new Complex(gotRe[0], gotIm[0]).subtract(exact).norm() / exact.norm()).as("f = %s", f)
                .isLessThan(2e-4);
    }
}
