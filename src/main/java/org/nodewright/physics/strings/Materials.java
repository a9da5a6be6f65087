package org.nodewright.physics.strings;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The materials catalogue. Every value is a typical, rounded value for drawn wire or monofilament
 * of string gauges, quoted from memory of handbook ranges — not a maker's guaranteed figure.
 * Tensile strength of drawn wire depends strongly on diameter and temper: trust the string maker's
 * published data over these numbers.
 */
public final class Materials {

    private static final String MEMORY = "typical value, from memory";

    private static final List<Material> ALL = List.of(
            new Material("plain-steel", "Plain steel (music wire)", 7850, 200e9, 2.6e9,
                    MEMORY + ": density and modulus of carbon steel as in the CRC Handbook of Chemistry and "
                            + "Physics and ASM Metals Handbook; strength of thin music wire (ASTM A228 ranges "
                            + "2.3–3.0 GPa below 1 mm, falling with diameter)"),
            new Material("stainless-steel", "Stainless steel (302/304 spring temper)", 7900, 193e9, 2.0e9,
                    MEMORY + ": ASM Metals Handbook values for 302/304 austenitic stainless; spring-temper wire "
                            + "strength (ASTM A313 ranges 1.7–2.4 GPa for thin wire)"),
            new Material("nickel-plated-steel", "Nickel-plated steel", 7870, 200e9, 2.4e9,
                    MEMORY + ": steel values with a thin nickel plate (nickel 8900 kg/m³, CRC Handbook) "
                            + "raising the density slightly; strength taken a little below plain music wire"),
            new Material("phosphor-bronze", "Phosphor bronze (CuSn5, C51000)", 8860, 110e9, 0.90e9,
                    MEMORY + ": Copper Development Association data for C51000 (density 8.86 g/cm³, "
                            + "E ≈ 110 GPa, spring-temper wire 0.8–1.0 GPa)"),
            new Material("bronze-80-20", "80/20 bronze (CuZn20 brass, C24000)", 8670, 110e9, 0.70e9,
                    MEMORY + ": Copper Development Association data for C24000 low brass, sold in the trade "
                            + "as 80/20 bronze (density 8.67 g/cm³, E ≈ 110 GPa, hard wire 0.6–0.85 GPa)"),
            new Material("copper", "Copper (silver-plated or bare wrap)", 8960, 117e9, 0.35e9,
                    MEMORY + ": CRC Handbook density of copper 8.96 g/cm³, E ≈ 117–130 GPa, hard-drawn "
                            + "wire 0.3–0.45 GPa"),
            new Material("nylon", "Nylon 6,6 monofilament", 1140, 4.0e9, 0.45e9,
                    MEMORY + ": polyamide 6,6 density 1.14 g/cm³ (polymer handbooks); drawn monofilament "
                            + "modulus 3–5 GPa and strength 0.35–0.6 GPa, far above the bulk resin"),
            new Material("fluorocarbon", "Fluorocarbon (PVDF monofilament)", 1780, 2.5e9, 0.35e9,
                    MEMORY + ": polyvinylidene fluoride density 1.78 g/cm³ (polymer handbooks); drawn "
                            + "monofilament modulus 2–4 GPa, strength 0.25–0.45 GPa"),
            new Material("gut", "Gut (sheep intestine)", 1300, 5.0e9, 0.35e9,
                    MEMORY + ": density 1.28–1.33 g/cm³, modulus 3–7 GPa, strength 0.3–0.4 GPa, varying "
                            + "with twist, humidity and finish"));

    private static final Map<String, Material> BY_ID = index();

    private Materials() {
    }

    private static Map<String, Material> index() {
        Map<String, Material> map = new LinkedHashMap<>();
        ALL.forEach(m -> map.put(m.id(), m));
        return Map.copyOf(map);
    }

    public static List<Material> all() {
        return ALL;
    }

    public static Optional<Material> find(String id) {
        return id == null ? Optional.empty() : Optional.ofNullable(BY_ID.get(id));
    }

    /** @throws IllegalArgumentException for an unknown id */
    public static Material get(String id) {
        return find(id).orElseThrow(() -> new IllegalArgumentException("unknown material " + id));
    }
}
