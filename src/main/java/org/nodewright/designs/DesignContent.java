package org.nodewright.designs;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import tools.jackson.databind.JsonNode;

/** What a save writes: everything of a design that its author edits. Tags are trimmed and de-duplicated. */
record DesignContent(String name, DesignKind kind, JsonNode parameters, String notes, List<String> tags,
        DesignUnits units) {

    /** Content without units: the design keeps the units it has (or none). */
    DesignContent(String name, DesignKind kind, JsonNode parameters, String notes, List<String> tags) {
        this(name, kind, parameters, notes, tags, null);
    }

    DesignContent {
        name = name.strip();
        notes = notes == null ? "" : notes;
        tags = normalise(tags);
    }

    static String tagKey(String tag) {
        return tag.strip().toLowerCase(Locale.ROOT);
    }

    private static List<String> normalise(List<String> tags) {
        if (tags == null) {
            return List.of();
        }
        Map<String, String> byKey = new LinkedHashMap<>();
        for (String t : tags) {
            if (t != null && !t.isBlank()) {
                byKey.putIfAbsent(tagKey(t), t.strip());
            }
        }
        return List.copyOf(new ArrayList<>(byKey.values()));
    }
}
