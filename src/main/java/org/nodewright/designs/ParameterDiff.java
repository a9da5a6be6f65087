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
 * ({@code lengthMm}, {@code holes[2].diameterMm}). Designs compare by their effective values: a
 * top-level field one side omits counts as its kind's default (the request's {@code DEFAULTS}),
 * and numbers are the same when they agree to {@link #RELATIVE_SAME} (5 significant digits:
 * 329.6276 Hz and 329.63 Hz, 0.01 cents apart, are one pitch). A leaf present on one side only is
 * otherwise a difference with null on the other side.
 */
final class ParameterDiff {

    private ParameterDiff() {
    }

    /** Numbers within this fraction of the larger of the two are the same value. */
    static final double RELATIVE_SAME = 5e-5;

    static List<Difference> between(JsonNode left, JsonNode right) {
        return between(left, right, Map.of());
    }

    /** As {@link #between(JsonNode, JsonNode)}, with omitted top-level fields read as the kind's defaults. */
    static List<Difference> between(DesignKind kind, JsonNode left, JsonNode right) {
        return between(left, right, defaults(kind));
    }

    private static List<Difference> between(JsonNode left, JsonNode right, Map<String, JsonNode> defaults) {
        Map<String, JsonNode> a = flatten(left);
        Map<String, JsonNode> b = flatten(right);
        for (Map.Entry<String, JsonNode> d : defaults.entrySet()) {
            if (a.get(d.getKey()) == null || a.get(d.getKey()).isNull()) {
                a.put(d.getKey(), d.getValue());
            }
            if (b.get(d.getKey()) == null || b.get(d.getKey()).isNull()) {
                b.put(d.getKey(), d.getValue());
            }
        }
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
            double u = x.doubleValue();
            double v = y.doubleValue();
            return x.decimalValue().compareTo(y.decimalValue()) == 0
                    || Math.abs(u - v) <= RELATIVE_SAME * Math.max(Math.abs(u), Math.abs(v));
        }
        return x.equals(y);
    }

    /** The kind's request DEFAULTS (a public static Map field), as JSON leaves; none when it has none. */
    private static Map<String, JsonNode> defaults(DesignKind kind) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        if (kind == null) {
            return out;
        }
        try {
            Object field = kind.requestClass().getField("DEFAULTS").get(null);
            if (field instanceof Map<?, ?> map) {
                tools.jackson.databind.node.JsonNodeFactory f = tools.jackson.databind.node.JsonNodeFactory.instance;
                for (Map.Entry<?, ?> e : map.entrySet()) {
                    Object v = e.getValue();
                    JsonNode node = v instanceof Boolean bo ? f.booleanNode(bo) : v instanceof Integer i ? f.numberNode(i)
                            : v instanceof Double d ? f.numberNode(d) : f.stringNode(String.valueOf(v));
                    out.put(String.valueOf(e.getKey()), node);
                }
            }
        } catch (NoSuchFieldException | IllegalAccessException e) {
            // A kind without DEFAULTS compares what is stored.
        }
        return out;
    }

    /** One leaf that differs; {@code left} or {@code right} is null where that side lacks it. */
    record Difference(String path, JsonNode left, JsonNode right) {
    }
}
