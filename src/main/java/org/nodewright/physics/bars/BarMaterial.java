package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A material for bars, with where its figures come from.
 *
 * @param id            the word requests use
 * @param name          a plain name
 * @param density       kg/m³
 * @param youngsModulus along the bar (along the grain for woods), Pa
 * @param shearModulus  in the plane of bending through the thickness, Pa
 * @param source        where the figures come from
 */
public record BarMaterial(String id, String name, double density, double youngsModulus, double shearModulus,
        String source) {

    public BarMaterial {
        Require.positive("density", density);
        Require.positive("youngsModulus", youngsModulus);
        Require.positive("shearModulus", shearModulus);
    }

    /** True for woods, whose dust needs the grinding caution. */
    public boolean isWood() {
        return id.equals("rosewood") || id.equals("padauk") || id.equals("maple");
    }
}
