package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

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

    // The expansion against the exact Bessel form: relative error of the loss part (value - 1),
    // for Gamma/(jk) and for Zc; the bounds are the validity stated in KeefeExpansion (the next,
    // fourth-order term of the expansion scales as 1/rv^4).
    @ParameterizedTest
    @CsvSource({"8, 6e-4, 3.5e-3", "12, 1.5e-4, 1e-3", "30, 1e-5, 7e-5", "49.5, 3e-6, 2e-5", "60, 2e-6, 2e-5",
        "200, 1e-6, 1e-6"})
    void expansionAgreesWithExactZwikkerKosten(double rv, double tol, double tolZ) {
        AirProperties air = AirProperties.at(20, 0);
        KeefeExpansion k = KeefeExpansion.forAir(air);
        Complex[] exact = ZwikkerKosten.normalisedAt(rv, air.gamma(), Math.sqrt(air.prandtl()));
        Complex g = k.propagation(rv);
        Complex z = k.characteristic(rv);
        assertThat(g.subtract(exact[0]).norm() / exact[0].subtract(1).norm()).isLessThan(tol);
        assertThat(z.subtract(exact[1]).norm() / exact[1].subtract(1).norm()).isLessThan(tolZ);
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

    @Test
    void lossyCylinderMatchesTheExactZwikkerKostenForm() {
        // A closed-input cylinder with p = 0 at its far end: Zin = Zc tanh(Gamma L) with Gamma and Zc
        // from the exact Bessel form of Zwikker & Kosten; the solver uses Keefe's expansion.
        AirProperties air = AirProperties.at(20, 0);
        double a = 0.0075;
        double len = 0.6;
        AirColumn col = new AirColumn(List.of(new BoreSegment(len, a, a)), List.of(), InputEnd.CLOSED,
                OutputEnd.IDEAL_OPEN, air, true);
        TransferMatrixSolver solver = new TransferMatrixSolver(col);
        int n = 300;
        double[] re = new double[n];
        double[] im = new double[n];
        solver.inputImpedance(30, 10, n, re, im);
        for (int i = 0; i < n; i++) {
            double f = 30 + 10 * i;
            double omega = 2 * Math.PI * f;
            Complex[] ex = ZwikkerKosten.normalised(air, a, omega);
            Complex gammaL = Complex.I.multiply(omega / air.speedOfSound() * len).multiply(ex[0]);
            Complex zin = ex[1].multiply(gammaL.tanh());
            Complex got = new Complex(re[i], im[i]);
            assertThat(got.subtract(zin).norm() / zin.norm()).as("f = %s", f).isLessThan(2e-4);
        }
    }
}
