package org.nodewright.physics.strings;

import org.nodewright.physics.Require;

/**
 * A string or wrap-wire material with typical properties.
 *
 * @param id                 stable identifier used in requests ("plain-steel")
 * @param name               a readable name
 * @param densityKgPerM3     mass density ρ
 * @param youngsModulusPa    Young's modulus E
 * @param tensileStrengthPa  typical ultimate tensile strength of drawn wire of string gauges
 * @param source             where the values come from, honestly stated
 */
public record Material(String id, String name, double densityKgPerM3, double youngsModulusPa,
        double tensileStrengthPa, String source) {

    public Material {
        if (id == null || id.isBlank() || name == null || source == null) {
            throw new IllegalArgumentException("material id, name and source are required");
        }
        Require.positive("densityKgPerM3", densityKgPerM3);
        Require.positive("youngsModulusPa", youngsModulusPa);
        Require.positive("tensileStrengthPa", tensileStrengthPa);
    }
}
