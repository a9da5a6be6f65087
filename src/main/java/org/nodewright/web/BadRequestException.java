package org.nodewright.web;

import java.util.List;

/**
 * Thrown by the web layer for a cross-field rule that Bean Validation cannot express; answered as
 * a 400 problem document listing each field.
 */
public class BadRequestException extends RuntimeException {

    private final transient List<FieldProblem> problems;

    public BadRequestException(List<FieldProblem> problems) {
        super(problems.isEmpty() ? "bad request" : problems.get(0).field() + ": " + problems.get(0).message());
        this.problems = List.copyOf(problems);
    }

    public BadRequestException(String field, String message) {
        this(List.of(new FieldProblem(field, message)));
    }

    public List<FieldProblem> problems() {
        return problems;
    }
}
