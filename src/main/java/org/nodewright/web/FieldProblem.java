package org.nodewright.web;

/** One offending field of a request: a dotted path (e.g. {@code segments[2].lengthMm}) and why. */
public record FieldProblem(String field, String message) {
}
