package org.nodewright.physics.aircolumn;

/**
 * The air of one element relative to the chain's reference air (the air at x = 0), so that every
 * impedance stays divided by the reference rho c and every wavenumber is the reference omega / c
 * times a factor: kappa = c_ref / c (k = kappa k_ref), sigma = sqrt((rho/mu) / (rho/mu)_ref)
 * (rv = sigma rv_ref) and zeta = rho c / (rho c)_ref. All three are 1 without breath.
 */
record LocalAir(AirProperties air, KeefeExpansion keefe, double kappa, double sigma, double zeta) {

    /** The reference air itself. */
    static LocalAir reference(AirProperties ref, KeefeExpansion keefe) {
        return new LocalAir(ref, keefe, 1, 1, 1);
    }

    /** Air a relative to the reference ref. */
    static LocalAir relative(AirProperties a, AirProperties ref) {
        return new LocalAir(a, KeefeExpansion.forAir(a), ref.speedOfSound() / a.speedOfSound(),
                Math.sqrt(a.density() / a.viscosity() / (ref.density() / ref.viscosity())),
                a.density() * a.speedOfSound() / (ref.density() * ref.speedOfSound()));
    }
}
