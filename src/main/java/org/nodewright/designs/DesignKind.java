package org.nodewright.designs;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.Arrays;
import java.util.Optional;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.plates.PlateAnalysisRequest;
import org.nodewright.strings.StringAnalysisRequest;
import org.nodewright.strings.StringSetRequest;

/**
 * The kinds of design the library keeps. Each kind names the analysis request its parameters must
 * be (validated by the same rules as the analysis endpoint), the endpoint that analyses them and
 * the designer page that opens them: the one place that maps a kind to its request class.
 */
public enum DesignKind {

    @JsonProperty("string")
    STRING("string", StringAnalysisRequest.class, "/api/v1/strings/analyze", "/strings"),

    @JsonProperty("string-set")
    STRING_SET("string-set", StringSetRequest.class, "/api/v1/string-sets/analyze",
            "/string-sets"),

    @JsonProperty("air-column")
    AIR_COLUMN("air-column", AirColumnRequest.class, "/api/v1/air-columns/analyze",
            "/air-columns"),

    @JsonProperty("bar")
    BAR("bar", BarAnalysisRequest.class, "/api/v1/bars/analyze", "/bars"),

    @JsonProperty("plate")
    PLATE("plate", PlateAnalysisRequest.class, "/api/v1/plates/analyze", "/plates");

    private final String word;
    private final Class<?> requestClass;
    private final String analyzePath;
    private final String designerPath;

    DesignKind(String word, Class<?> requestClass, String analyzePath, String designerPath) {
        this.word = word;
        this.requestClass = requestClass;
        this.analyzePath = analyzePath;
        this.designerPath = designerPath;
    }

    /** The word used in JSON, in the database and in URLs ({@code string-set}). */
    public String word() {
        return word;
    }

    /** The analysis request that this kind's parameters must be. */
    public Class<?> requestClass() {
        return requestClass;
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
