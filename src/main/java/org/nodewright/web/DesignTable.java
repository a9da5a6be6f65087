package org.nodewright.web;

import org.springframework.http.ResponseEntity;

/**
 * The CSV table of a saved design, offered by the feature that owns the design's request type
 * (one bean per request type). {@code GET /api/v1/designs/{id}/csv} reads the design's parameters
 * into {@link #requestType()}, validates them and asks the table for its CSV.
 */
public interface DesignTable {

    /** The request record this table reads (the design kind's request class). */
    Class<?> requestType();

    /** The table of a validated request, as a download named {@code filename}. */
    ResponseEntity<String> csv(Object request, String filename);

    /** A table for {@code type} written by {@code writer}. */
    static <R> DesignTable of(Class<R> type, java.util.function.BiFunction<R, String, ResponseEntity<String>> writer) {
        return new DesignTable() {
            @Override
            public Class<?> requestType() {
                return type;
            }

            @Override
            public ResponseEntity<String> csv(Object request, String filename) {
                return writer.apply(type.cast(request), filename);
            }
        };
    }
}
