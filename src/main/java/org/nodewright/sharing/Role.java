package org.nodewright.sharing;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.Arrays;
import java.util.Optional;

/** What an account may do in LAN mode; each role includes the ones before it. */
public enum Role {
    /** Reads everything and runs every analysis, but changes no saved design. */
    @JsonProperty("viewer") VIEWER("viewer"),
    /** Also creates, changes and deletes saved designs. */
    @JsonProperty("editor") EDITOR("editor"),
    /** Also manages accounts. */
    @JsonProperty("admin") ADMIN("admin");

    private final String word;

    Role(String word) {
        this.word = word;
    }

    /** The lower-case word used in JSON, forms and the database. */
    public String word() {
        return word;
    }

    /** The Spring Security authority, {@code ROLE_VIEWER} etc. */
    String authority() {
        return "ROLE_" + name();
    }

    static Optional<Role> fromWord(String word) {
        return Arrays.stream(values()).filter(r -> r.word.equals(word)).findFirst();
    }
}
