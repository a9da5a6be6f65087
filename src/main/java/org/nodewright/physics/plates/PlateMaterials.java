package org.nodewright.physics.plates;

import java.util.List;
import java.util.Optional;

/**
 * Typical sheet materials for plates. Wood is quarter-sawn (x = longitudinal L, y = radial R), so
 * E across = E_R, G = G_LR and nu_xy = nu_LR. The ratios E_R/E_L, G_LR/E_L and nu_LR are those the USDA
 * Wood Handbook (FPL-GTR-190, 2010, Table 5-1) lists for the species named, and E_L and density are
 * typical air-dry values of its Table 5-3, all quoted from memory; one board differs from the next by
 * 20 % or more, so measure the plate (tap tones) before trusting a thickness.
 */
public final class PlateMaterials {

    private static final String HANDBOOK = "USDA Wood Handbook FPL-GTR-190 (2010), Tables 5-1 and 5-3 "
            + "(ratios E_R/E_L, G_LR/E_L, nu_LR; typical E_L and density at 12 % moisture), from memory";

    private static final List<CatalogueMaterial> ALL = List.of(
            wood("spruce", "Spruce (Sitka), quarter-sawn", 450, 11.0e9, 0.078, 0.064, 0.372, HANDBOOK + "; Sitka spruce"),
            wood("cedar", "Western red cedar, quarter-sawn", 370, 7.7e9, 0.081, 0.087, 0.378, HANDBOOK + "; western redcedar"),
            wood("maple", "Maple (sugar), quarter-sawn", 705, 12.6e9, 0.132, 0.111, 0.424, HANDBOOK + "; sugar maple"),
            wood("mahogany", "Mahogany, quarter-sawn", 590, 10.3e9, 0.107, 0.066, 0.314, HANDBOOK + "; mahogany"),
            wood("rosewood-like", "Rosewood-like dense hardwood", 850, 12.0e9, 0.12, 0.08, 0.35,
                    "typical, from memory (the Handbook's tables hold no rosewood; dense tropical hardwood values)"),
            new CatalogueMaterial("aluminium", "Aluminium sheet (isotropic check)", PlateMaterial.isotropic(2700, 69e9, 0.33),
                    "typical handbook values for wrought aluminium, from memory"),
            new CatalogueMaterial("birch-plywood", "Birch plywood (along the face grain)",
                    new PlateMaterial(680, 8.0e9, 5.0e9, 0.62e9, 0.07),
                    "typical, from memory (multi-ply birch: the cross plies make it nearly isotropic in bending)"));

    private PlateMaterials() {
    }

    private static CatalogueMaterial wood(String id, String name, double density, double eL, double rRatio,
                                          double gRatio, double nuLR, String source) {
        return new CatalogueMaterial(id, name, new PlateMaterial(density, eL, rRatio * eL, gRatio * eL, nuLR), source);
    }

    public static List<CatalogueMaterial> all() {
        return ALL;
    }

    public static Optional<CatalogueMaterial> byId(String id) {
        return ALL.stream().filter(m -> m.id().equals(id)).findFirst();
    }
}
