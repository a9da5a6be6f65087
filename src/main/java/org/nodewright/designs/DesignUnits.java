package org.nodewright.designs;

import jakarta.validation.constraints.Pattern;

/**
 * The units a design was last shown in on its bench (the pages' unit switches), kept with the
 * design so that whoever opens it sees it as it was saved. Either part may be left out.
 */
public record DesignUnits(
        @Pattern(regexp = "mm|inch", message = "must be mm or inch") String length,
        @Pattern(regexp = "N|kgf|lbf", message = "must be N, kgf or lbf") String force) {

    /** Stored as "length/force", a missing part empty: "inch/lbf", "mm/", "/kgf". */
    String stored() {
        return (length == null ? "" : length) + "/" + (force == null ? "" : force);
    }

    /** The stored form read back; null for null or "/". */
    static DesignUnits fromStored(String stored) {
        if (stored == null || stored.isBlank() || "/".equals(stored)) {
            return null;
        }
        int slash = stored.indexOf('/');
        String length = slash < 0 ? stored : stored.substring(0, slash);
        String force = slash < 0 ? "" : stored.substring(slash + 1);
        return new DesignUnits(length.isEmpty() ? null : length, force.isEmpty() ? null : force);
    }
}
