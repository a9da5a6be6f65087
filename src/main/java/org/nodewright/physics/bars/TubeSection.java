package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A round tube (a chime).
 *
 * @param diameter outside diameter, m
 * @param bore     inside diameter, m, smaller than the outside diameter
 */
public record TubeSection(double diameter, double bore) implements CircularSection {

    public TubeSection {
        Require.positive("diameter", diameter);
        Require.positive("bore", bore);
        if (!(bore < diameter)) {
            throw new IllegalArgumentException("bore must be smaller than diameter, got bore " + bore
                    + " and diameter " + diameter);
        }
    }

    /** A = π (D² − d²) / 4. */
    @Override
    public double area(double x) {
        return Math.PI * (diameter * diameter - bore * bore) / 4.0;
    }

    /** I = π (D⁴ − d⁴) / 64. */
    @Override
    public double secondMoment(double x) {
        return Math.PI * (Math.pow(diameter, 4) - Math.pow(bore, 4)) / 64.0;
    }

    /** J = π (D⁴ − d⁴) / 32 (closed circular tube, no warping). */
    @Override
    public double torsionConstant(double x) {
        return Math.PI * (Math.pow(diameter, 4) - Math.pow(bore, 4)) / 32.0;
    }

    @Override
    public double shearCoefficient(double nu) {
        return CowperShearCoefficient.tube(nu, bore / diameter);
    }
}
