package org.nodewright.templates.render;

import java.util.Locale;
import java.util.Optional;

/** Paper sizes a template PDF can be tiled over, portrait dimensions in mm. */
public enum Paper {
    /** ISO 216 A4: 210 mm x 297 mm. */
    A4(210.0, 297.0),
    /** ANSI Letter: 8.5 in x 11 in = 215.9 mm x 279.4 mm. */
    LETTER(215.9, 279.4);

    private final double shortMm;
    private final double longMm;

    Paper(double shortMm, double longMm) {
        this.shortMm = shortMm;
        this.longMm = longMm;
    }

    /** The lower-case word used in requests: {@code a4} or {@code letter}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Optional<Paper> fromWord(String word) {
        for (Paper p : values()) {
            if (p.word().equals(word)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /** The paper a request's {@code paper} parameter asks for: a4 when absent, a 400 naming the field when unknown. */
    public static Paper ofRequest(String word) {
        if (word == null) {
            return A4;
        }
        return fromWord(word).orElseThrow(() -> new org.nodewright.web.BadRequestException("paper", "must be a4 or letter"));
    }

    public double shortMm() {
        return shortMm;
    }

    public double longMm() {
        return longMm;
    }
}
