package org.nodewright.sheets;

import java.util.List;

/**
 * Who and what a sheet is of: the design's name, its revision ("3", or "unsaved"), the date of that
 * revision as printed, who saved it, and its tags.
 */
public record SheetHeader(String name, String revision, String date, String savedBy, List<String> tags) {

    public SheetHeader {
        tags = tags == null ? List.of() : List.copyOf(tags);
    }
}
