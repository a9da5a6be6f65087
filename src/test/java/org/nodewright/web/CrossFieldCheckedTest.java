package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.tuple;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import jakarta.validation.ValidatorFactory;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class CrossFieldCheckedTest {

    /** A record whose rules report whatever problems it is built with. */
    @CrossFieldChecked
    record Reported(List<FieldProblem> problems) implements CrossFieldChecked.Rules {
        @Override
        public List<FieldProblem> crossFieldProblems() {
            return problems;
        }
    }

    private static ValidatorFactory factory;
    private static Validator validator;

    @BeforeAll
    static void start() {
        factory = Validation.buildDefaultValidatorFactory();
        validator = factory.getValidator();
    }

    @AfterAll
    static void stop() {
        factory.close();
    }

    @Test
    void consistentRecordsHaveNoViolation() {
        assertThat(validator.validate(new Reported(List.of()))).isEmpty();
    }

    @Test
    void everyPathShapeOfOurRequestsComesOutAsWritten() {
        List<String> paths = List.of("fMaxHz", "pluck.positionMm", "pickups[1].apertureMm",
                "bore.holes", "bore.holes[0].positionMm", "fingerings[2].closedHoles[1]", "limits.maxFootMm");
        Set<ConstraintViolation<Reported>> found = validator.validate(new Reported(
                paths.stream().map(p -> new FieldProblem(p, "problem at " + p)).toList()));
        assertThat(found).extracting(v -> v.getPropertyPath().toString(), ConstraintViolation::getMessage)
                .containsExactlyInAnyOrderElementsOf(paths.stream().map(p -> tuple(p, "problem at " + p)).toList());
    }

    @Test
    void messagesAreTakenLiterallyNotInterpolated() {
        String message = "must be {min} or ${1 + 1} \\ as typed";
        Set<ConstraintViolation<Reported>> found =
                validator.validate(new Reported(List.of(new FieldProblem("lengthMm", message))));
        assertThat(found).extracting(ConstraintViolation::getMessage).containsExactly(message);
    }
}
