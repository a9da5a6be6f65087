package org.nodewright.plates;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.nodewright.physics.plates.WorkshopPlates;

/** Ready-made plate requests from the Harrowgate Lane Workshop (invented instruments) for the bench's preset menu. */
final class PlatePresets {

    private PlatePresets() {
    }

    record Preset(String id, String name, Map<String, Object> request) {
    }

    static List<Preset> all() {
        List<Preset> out = new ArrayList<>();
        Map<String, Object> rect = base("spruce", 3.0, "free", 10);
        rect.put("outline", "rectangle");
        rect.put("lengthMm", 400.0);
        rect.put("widthMm", 300.0);
        out.add(new Preset("test-rectangle", "Spruce test plate 400 x 300 mm (free)", rect));
        Map<String, Object> parlour = base("spruce", 2.8, "free", 12);
        parlour.put("outline", points(WorkshopPlates.PARLOUR_HALF_MM));
        parlour.put("mirrorHalf", true);
        List<Map<String, Object>> braces = new ArrayList<>();
        for (double[] b : WorkshopPlates.PARLOUR_BRACES_MM) {
            Map<String, Object> brace = new LinkedHashMap<>();
            brace.put("fromMm", List.of(b[0], b[1]));
            brace.put("toMm", List.of(b[2], b[3]));
            brace.put("widthMm", b[4]);
            brace.put("heightMm", b[5]);
            braces.add(brace);
        }
        parlour.put("braces", braces);
        out.add(new Preset("lane-parlour-top", "Lane parlour guitar top, braced (free)", parlour));
        Map<String, Object> fiddle = base("maple", 4.0, "free", 10);
        fiddle.put("outline", points(WorkshopPlates.FIDDLE_HALF_MM));
        fiddle.put("mirrorHalf", true);
        out.add(new Preset("lane-fiddle-back", "Lane fiddle back, maple (free)", fiddle));
        Map<String, Object> disc = base("aluminium", 2.0, "clamped", 6);
        List<List<Double>> circle = new ArrayList<>();
        for (int i = 0; i < 72; i++) {
            double t = 2 * Math.PI * i / 72;
            circle.add(List.of(Math.round(1e3 * (150 + 150 * Math.cos(t))) / 1e3,
                    Math.round(1e3 * (150 + 150 * Math.sin(t))) / 1e3));
        }
        disc.put("outline", circle);
        out.add(new Preset("clamped-disc", "Aluminium disc 300 mm, clamped rim (check plate)", disc));
        return out;
    }

    private static Map<String, Object> base(String material, double thickness, String edges, int modes) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("material", material);
        m.put("thicknessMm", thickness);
        m.put("edges", edges);
        m.put("modeCount", modes);
        return m;
    }

    private static List<List<Double>> points(double[][] mm) {
        List<List<Double>> out = new ArrayList<>();
        for (double[] p : mm) {
            out.add(List.of(p[0], p[1]));
        }
        return out;
    }
}
