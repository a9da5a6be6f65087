package org.nodewright.designs;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tools.jackson.databind.JsonNode;

/**
 * The parameters that differ between two designs, leaf by leaf, each named by its dotted path
 * ({@code lengthMm}, {@code holes[2].diameterMm}). A leaf present on one side only is a difference
 * with null on the other side; numbers compare by value (650 equals 650.0).
 */
final class ParameterDiff {

    private ParameterDiff() {
    }

    static List<Difference> between(JsonNode left, JsonNode right) {
        Map<String, JsonNode> a = flatten(left);
        Map<String, JsonNode> b = flatten(right);
        Set<String> paths = new LinkedHashSet<>(a.keySet());
        paths.addAll(b.keySet());
        List<Difference> out = new ArrayList<>();
        for (String path : paths) {
            JsonNode x = a.get(path);
            JsonNode y = b.get(path);
            if (!same(x, y)) {
                out.add(new Difference(path, x, y));
            }
        }
        return out;
    }

    static Map<String, JsonNode> flatten(JsonNode node) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        flatten("", node, out);
        return out;
    }

    private static void flatten(String path, JsonNode node, Map<String, JsonNode> out) {
        if (node == null || node.isMissingNode()) {
            return;
        }
        if (node.isObject() && !node.isEmpty()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                flatten(path.isEmpty() ? e.getKey() : path + "." + e.getKey(), e.getValue(), out);
            }
        } else if (node.isArray() && !node.isEmpty()) {
            for (int i = 0; i < node.size(); i++) {
                flatten(path + "[" + i + "]", node.get(i), out);
            }
        } else {
            out.put(path, node);
        }
    }

    private static boolean same(JsonNode x, JsonNode y) {
        boolean xNull = x == null || x.isNull();
        boolean yNull = y == null || y.isNull();
        if (xNull || yNull) {
            return xNull && yNull;
        }
        if (x.isNumber() && y.isNumber()) {
            return x.decimalValue().compareTo(y.decimalValue()) == 0;
        }
        return x.equals(y);
    }

    /** One leaf that differs; {@code left} or {@code right} is null where that side lacks it. */
    record Difference(String path, JsonNode left, JsonNode right) {
    }
}
