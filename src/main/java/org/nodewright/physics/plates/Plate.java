package org.nodewright.physics.plates;

import java.util.List;

/**
 * A thin plate to analyse: outline (metres, x along the grain), material, thickness, edge condition and braces.
 */
public record Plate(Outline outline, PlateMaterial material, ThicknessField thickness, EdgeCondition edges,
                    List<Brace> braces) {

    public Plate {
        if (outline == null || material == null || thickness == null || edges == null) {
            throw new IllegalArgumentException("outline, material, thickness and edges are required");
        }
        braces = braces == null ? List.of() : List.copyOf(braces);
        for (int i = 0; i < braces.size(); i++) {
            Brace b = braces.get(i);
            if (!braceInside(outline, b)) {
                throw new IllegalArgumentException("brace " + i + " leaves the outline");
            }
        }
    }

    /** True when a brace's whole line lies inside the outline (ends inside or on it, never crossing it). */
    public static boolean braceInside(Outline outline, Brace b) {
        if (!outline.contains(b.x1(), b.y1()) || !outline.contains(b.x2(), b.y2())) {
            return false;
        }
        double mx = (b.x1() + b.x2()) / 2;
        double my = (b.y1() + b.y2()) / 2;
        if (!outline.contains(mx, my)) {
            return false;
        }
        double f1 = outline.exitFraction(mx, my, b.x1(), b.y1());
        double f2 = outline.exitFraction(mx, my, b.x2(), b.y2());
        return f1 > 1 - 1e-9 && f2 > 1 - 1e-9;
    }
}
