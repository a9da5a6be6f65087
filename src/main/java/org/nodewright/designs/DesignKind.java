package org.nodewright.designs;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.Arrays;
import java.util.Optional;

/**
 * The kinds of design the library keeps. Each kind names the analysis request its parameters must
 * be (validated by the same rules as the analysis endpoint), the endpoint that analyses them and
 * the designer page that opens them. {@link DesignParameters} is the one place that maps a kind to
 * its request class.
 */
public enum DesignKind {

    @JsonProperty("string")
    STRING("string", "org.nodewright.strings.StringAnalysisRequest", "/api/v1/strings/analyze", "/strings"),

    @JsonProperty("string-set")
    STRING_SET("string-set", "org.nodewright.strings.StringSetRequest", "/api/v1/string-sets/analyze",
            "/string-sets"),

    @JsonProperty("air-column")
    AIR_COLUMN("air-column", "org.nodewright.aircolumns.AirColumnRequest", "/api/v1/air-columns/analyze",
            "/air-columns");

    private final String word;
    private final String requestClassName;
    private final String analyzePath;
    private final String designerPath;

    DesignKind(String word, String requestClassName, String analyzePath, String designerPath) {
        this.word = word;
        this.requestClassName = requestClassName;
        this.analyzePath = analyzePath;
        this.designerPath = designerPath;
    }

    /** The word used in JSON, in the database and in URLs ({@code string-set}). */
    public String word() {
        return word;
    }

    String requestClassName() {
        return requestClassName;
    }

    public String analyzePath() {
        return analyzePath;
    }

    public String designerPath() {
        return designerPath;
    }

    public static Optional<DesignKind> fromWord(String word) {
        return Arrays.stream(values()).filter(k -> k.word.equals(word)).findFirst();
    }
}
