package org.nodewright.physics.bars;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The bar materials catalogue: typical, rounded figures with where they come from. Woods vary
 * from board to board by 20 % and more: the bench tells the maker to measure the blank (a tapped
 * bar's recording fits E and G) and trust that over these figures. Shear moduli of woods are the
 * longitudinal–radial modulus (a flat-sawn bar bending through its thickness shears in that plane).
 */
public final class BarMaterials {

    private static final String WOOD_HANDBOOK =
            "USDA Forest Products Laboratory, Wood Handbook, FPL-GTR-190 (2010), ch. 5 (12 % moisture)";
    private static final String MEMORY = " — from memory, not re-checked against the table";

    private static final List<BarMaterial> ALL = List.of(
            new BarMaterial("rosewood", "Rosewood-like tropical hardwood (marimba grade)", 1050, 20.0e9, 1.5e9,
                    "From memory: typical of dense marimba-grade rosewoods (Honduras rosewood is not in the "
                            + WOOD_HANDBOOK + "; its imported-woods table gives the lighter Brazilian and Indian "
                            + "rosewoods); G from the handbook's hardwood ratio G_LR/E_L ≈ 0.075"),
            new BarMaterial("padauk", "Padauk-like tropical hardwood", 750, 11.7e9, 0.95e9,
                    WOOD_HANDBOOK + ", imported woods table (African padauk)" + MEMORY
                            + "; G from the hardwood ratio G_LR/E_L ≈ 0.08"),
            new BarMaterial("maple", "Hard maple (sugar maple)", 705, 12.6e9, 1.40e9,
                    WOOD_HANDBOOK + ", Table 5-3a (sugar maple: specific gravity 0.63, MOE 12.6 GPa) and "
                            + "Table 5-1 (G_LR/E_L = 0.111)" + MEMORY),
            new BarMaterial("fibreglass", "Fibreglass-like composite (unidirectional glass/epoxy)", 1950, 32.0e9, 4.0e9,
                    "From memory: typical unidirectional E-glass/epoxy at about 55 % fibre by volume "
                            + "(composites handbooks); ask the bar maker for the laminate's figures"),
            new BarMaterial("aluminium", "Aluminium alloy (6061-T6)", 2700, 68.9e9, 26.0e9,
                    "ASM Metals Handbook, Vol. 2 (1990), 6061-T6 — from memory"),
            new BarMaterial("brass", "Brass (C26000 cartridge brass)", 8530, 110e9, 40.0e9,
                    "ASM Metals Handbook, Vol. 2 (1990), and Copper Development Association data for C26000 "
                            + "— from memory"),
            new BarMaterial("steel", "Carbon steel (spring steel, e.g. 1075–1095)", 7850, 205e9, 80.0e9,
                    "ASM Metals Handbook, Vol. 1 (1990), carbon steels — from memory"),
            new BarMaterial("bell-bronze", "Bell bronze (about 78 % Cu, 22 % Sn)", 8600, 100e9, 37.0e9,
                    "From memory: cast high-tin bronze as quoted in metals handbooks (ASM Vol. 2) and "
                            + "bell-founding literature; castings vary, measure the blank"));

    private static final Map<String, BarMaterial> BY_ID = index();

    private BarMaterials() {
    }

    public static List<BarMaterial> all() {
        return ALL;
    }

    public static Optional<BarMaterial> byId(String id) {
        return Optional.ofNullable(BY_ID.get(id));
    }

    private static Map<String, BarMaterial> index() {
        Map<String, BarMaterial> m = new LinkedHashMap<>();
        for (BarMaterial mat : ALL) {
            m.put(mat.id(), mat);
        }
        return m;
    }
}
