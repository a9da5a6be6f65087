package org.nodewright.sheets;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import tools.jackson.databind.JsonNode;

/**
 * A design's parameters as a maker reads them: each stored leaf with a label in words, its unit
 * taken from the field name's suffix ({@code positionMm} → "position (mm)"), list items numbered
 * from 1 ({@code pickups[0].positionMm} → "pickup 1 position (mm)"), hole indices shown from 1 as
 * the benches number them. Values are printed as stored (nothing rounded away).
 */
public final class ParameterRows {

    /** Suffixes of the contract's field names and the units they mean, longest first. */
    private static final String[][] UNITS = {
        {"KgPerM3", "kg/m³"}, {"KgPerM", "kg/m"}, {"Mm3", "mm³"}, {"Mm", "mm"}, {"Hz", "Hz"}, {"Pa", "Pa"},
        {"Kgf", "kgf"}, {"Pct", "%"}, {"Cents", "cents"}, {"Rad", "rad"}, {"C", "°C"}, {"N", "N"}, {"S", "s"},
    };
    private static final Pattern INDEX = Pattern.compile("^(.*?)\\[(\\d+)]$");
    /** Lists whose items are hole indices counted from 0 in the request (shown from 1). */
    private static final List<String> HOLE_INDEX_LISTS = List.of("closedHoles", "halfHoles");

    private ParameterRows() {
    }

    public static List<BenchSheet.Entry> of(JsonNode parameters) {
        List<BenchSheet.Entry> out = new ArrayList<>();
        walk("", "", parameters, out);
        return out;
    }

    private static void walk(String path, String label, JsonNode node, List<BenchSheet.Entry> out) {
        if (node == null || node.isNull() || node.isMissingNode()) {
            return;
        }
        if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                String[] words = words(e.getKey());
                walk(path.isEmpty() ? e.getKey() : path + "." + e.getKey(), join(label, words[0]), e.getValue(), out);
            }
        } else if (node.isArray()) {
            String last = lastName(path);
            if (HOLE_INDEX_LISTS.contains(last) && allIntegers(node)) {
                List<String> holes = new ArrayList<>();
                node.forEach(n -> holes.add(Long.toString(n.longValue() + 1)));
                out.add(new BenchSheet.Entry(label, holes.isEmpty() ? "none" : String.join(", ", holes)));
                return;
            }
            if (node.isEmpty()) {
                out.add(new BenchSheet.Entry(label, "none"));
                return;
            }
            boolean leaves = allLeaves(node);
            if (leaves) {
                List<String> values = new ArrayList<>();
                node.forEach(n -> values.add(text(n)));
                out.add(new BenchSheet.Entry(withUnit(label, last), String.join(", ", values)));
                return;
            }
            String item = singular(label);
            for (int i = 0; i < node.size(); i++) {
                walk(path + "[" + i + "]", item + " " + (i + 1), node.get(i), out);
            }
        } else {
            out.add(new BenchSheet.Entry(withUnit(label, lastName(path)), text(node)));
        }
    }

    /** The field name in words and its unit: {@code positionMm} → ["position", "mm"]. */
    static String[] words(String field) {
        String base = field;
        String unit = null;
        for (String[] u : UNITS) {
            if (field.endsWith(u[0]) && field.length() > u[0].length()
                    && !Character.isUpperCase(field.charAt(field.length() - u[0].length() - 1))) {
                base = field.substring(0, field.length() - u[0].length());
                unit = u[1];
                break;
            }
        }
        StringBuilder spaced = new StringBuilder();
        for (String word : base.replaceAll("([a-z0-9])([A-Z])", "$1 $2").split(" ")) {
            // "Length" reads "length"; "A4" and "CO2" keep their capitals
            String w = word.length() > 1 && word.substring(1).chars().anyMatch(Character::isLowerCase)
                    ? word.toLowerCase(Locale.ROOT) : word;
            spaced.append(spaced.length() == 0 ? "" : " ").append(w);
        }
        return new String[] {spaced.toString(), unit};
    }

    private static String withUnit(String label, String field) {
        String unit = words(field)[1];
        return unit == null ? label : label + " (" + unit + ")";
    }

    private static String lastName(String path) {
        String last = path.contains(".") ? path.substring(path.lastIndexOf('.') + 1) : path;
        Matcher m = INDEX.matcher(last);
        while (m.matches()) {
            last = m.group(1);
            m = INDEX.matcher(last);
        }
        return last;
    }

    private static String join(String label, String words) {
        String s = label.isEmpty() ? words : label + " " + words;
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static String singular(String label) {
        if (label.endsWith("ies")) {
            return label.substring(0, label.length() - 3) + "y";
        }
        if (label.endsWith("s") && !label.endsWith("ss")) {
            return label.substring(0, label.length() - 1);
        }
        return label;
    }

    private static boolean allLeaves(JsonNode array) {
        for (JsonNode n : array) {
            if (n.isContainer()) {
                return false;
            }
        }
        return true;
    }

    private static boolean allIntegers(JsonNode array) {
        for (JsonNode n : array) {
            if (!n.isIntegralNumber()) {
                return false;
            }
        }
        return true;
    }

    private static String text(JsonNode leaf) {
        if (leaf.isNumber() || leaf.isBoolean()) {
            return leaf.asString();
        }
        return leaf.isString() ? leaf.asString() : leaf.toString();
    }
}
