package org.nodewright.web;

import java.util.List;
import java.util.function.Supplier;
import org.hipparchus.exception.MathRuntimeException;

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

    /**
     * Runs a computation of the core on a request that passed validation: a numerical failure on an extreme but
     * valid request (IllegalArgumentException, IllegalStateException, a Hipparchus MathRuntimeException) is the
     * client's 400 on {@code field}, "{@code why}: the core's message", never a 500.
     */
    public static <T> T whenComputing(String field, String why, Supplier<T> computation) {
        try {
            return computation.get();
        } catch (IllegalArgumentException | IllegalStateException | MathRuntimeException e) {
            throw new BadRequestException(field, why + ": " + e.getMessage());
        }
    }

    public List<FieldProblem> problems() {
        return problems;
    }
}
