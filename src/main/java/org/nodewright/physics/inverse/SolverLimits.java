package org.nodewright.physics.inverse;

/**
 * The maker's limits for the tone-hole solver.
 *
 * @param minPositionMm     no hole centre closer than this to the input end
 * @param maxPositionMargin no hole centre closer than this to the output end (mm)
 * @param minSpacingMm      minimum clear wall between neighbouring holes' edges (mm)
 * @param minDiameterMm     smallest hole the maker will drill
 * @param maxDiameterMm     largest hole the maker will drill
 * @param vary diameters    whether diameters may change (otherwise only positions)
 * @param varyFoot          whether the last section's length may change (sets the all-closed note)
 * @param minFootMm         shortest allowed last section
 * @param maxFootMm         longest allowed last section
 */
public record SolverLimits(double minPositionMm, double maxPositionMargin, double minSpacingMm, double minDiameterMm,
        double maxDiameterMm, boolean varyDiameters, boolean varyFoot, double minFootMm, double maxFootMm) {

    public SolverLimits {
        for (double v : new double[] {minPositionMm, maxPositionMargin, minSpacingMm}) {
            if (!(v >= 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("position and spacing limits must be finite and >= 0");
            }
        }
        if (!(minDiameterMm > 0) || !(maxDiameterMm >= minDiameterMm) || !Double.isFinite(maxDiameterMm)) {
            throw new IllegalArgumentException("diameter limits must satisfy 0 < min <= max, were " + minDiameterMm
                    + ", " + maxDiameterMm);
        }
        if (!(minFootMm > 0) || !(maxFootMm >= minFootMm) || !Double.isFinite(maxFootMm)) {
            throw new IllegalArgumentException("foot limits must satisfy 0 < min <= max, were " + minFootMm + ", "
                    + maxFootMm);
        }
    }
}
