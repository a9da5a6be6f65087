package org.nodewright.strings;

import jakarta.validation.Constraint;
import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import jakarta.validation.Payload;
import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.nodewright.web.FieldProblem;

/**
 * Class-level constraint: the request's own {@link Rules#crossFieldProblems()} become violations on
 * their dotted paths ({@code pickups[1].apertureMm}), so validating the record alone finds every
 * problem, single-field and cross-field.
 */
@Documented
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@Constraint(validatedBy = CrossFieldChecked.Validator.class)
public @interface CrossFieldChecked {

    String message() default "is inconsistent with other fields";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};

    /** A request that knows its own cross-field rules. */
    interface Rules {
        /** Problems among fields that are each valid on their own; empty when consistent. */
        List<FieldProblem> crossFieldProblems();
    }

    /** Turns each {@link FieldProblem} into a violation at its path. */
    class Validator implements ConstraintValidator<CrossFieldChecked, Rules> {

        private static final Pattern INDEXED = Pattern.compile("([A-Za-z0-9_]+)\\[(\\d+)]");

        @Override
        public boolean isValid(Rules value, ConstraintValidatorContext context) {
            if (value == null) {
                return true;
            }
            List<FieldProblem> problems = value.crossFieldProblems();
            if (problems.isEmpty()) {
                return true;
            }
            context.disableDefaultConstraintViolation();
            for (FieldProblem p : problems) {
                add(context, p.field(), escape(p.message()));
            }
            return false;
        }

        /** Supports the paths our requests use: {@code a}, {@code a.b} and {@code a[i].b}. */
        private static void add(ConstraintValidatorContext context, String path, String message) {
            var builder = context.buildConstraintViolationWithTemplate(message);
            String[] parts = path.split("\\.", 2);
            if (parts.length == 1) {
                builder.addPropertyNode(path).addConstraintViolation();
                return;
            }
            Matcher m = INDEXED.matcher(parts[0]);
            if (m.matches()) {
                builder.addPropertyNode(m.group(1)).addPropertyNode(parts[1]).inIterable()
                        .atIndex(Integer.parseInt(m.group(2))).addConstraintViolation();
            } else {
                builder.addPropertyNode(parts[0]).addPropertyNode(parts[1]).addConstraintViolation();
            }
        }

        private static String escape(String message) {
            return message.replace("\\", "\\\\").replace("{", "\\{").replace("}", "\\}").replace("$", "\\$");
        }
    }
}
