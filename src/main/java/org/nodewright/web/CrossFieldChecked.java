package org.nodewright.web;

import jakarta.validation.Constraint;
import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import jakarta.validation.Payload;
import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The one mechanism for rules across fields. A request record carries this annotation and
 * implements {@link Rules}; Bean Validation then turns each {@link FieldProblem} it returns into a
 * violation on its dotted path ({@code pickups[1].apertureMm}, {@code bore.holes[0].positionMm},
 * {@code fingerings[2].closedHoles[1]}), so validating the record alone finds every problem,
 * single-field and cross-field, and the 400 answer names each field (see DEVELOPERS.md).
 *
 * <p>The rules run in the same pass as the single-field constraints: they must skip values that
 * are missing or unusable (those are reported by their own constraints) rather than fail on them.
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

        /** The value when it is present and finite, else null (its own constraints report it). */
        static Double usable(Double v) {
            return v != null && Double.isFinite(v) ? v : null;
        }
    }

    /** Turns each {@link FieldProblem} into a violation at its path. */
    class Validator implements ConstraintValidator<CrossFieldChecked, Rules> {

        private static final Pattern SEGMENT = Pattern.compile("([A-Za-z0-9_]+)((?:\\[\\d+])*)");

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

        /**
         * Builds the violation's property path from a dotted path: names separated by dots, each
         * optionally followed by one index ({@code a}, {@code a.b}, {@code a[i].b}, {@code a.b[i].c},
         * {@code a[i].b[j]}).
         *
         * @throws IllegalArgumentException for a path outside that grammar (a programming error)
         */
        static void add(ConstraintValidatorContext context, String path, String message) {
            List<String> names = new ArrayList<>();
            List<Integer> indices = new ArrayList<>();
            for (String part : path.split("\\.", -1)) {
                Matcher m = SEGMENT.matcher(part);
                if (!m.matches() || m.group(2).chars().filter(c -> c == '[').count() > 1) {
                    throw new IllegalArgumentException("not a field path: " + path);
                }
                names.add(m.group(1));
                indices.add(m.group(2).isEmpty() ? null : Integer.valueOf(m.group(2).substring(1,
                        m.group(2).length() - 1)));
            }
            var builder = context.buildConstraintViolationWithTemplate(message);
            // The index of a container is set on the node that follows it (Bean Validation's API);
            // a trailing index goes on a bean node inside the last container.
            ConstraintValidatorContext.ConstraintViolationBuilder.NodeBuilderCustomizableContext node =
                    builder.addPropertyNode(names.get(0));
            ConstraintValidatorContext.ConstraintViolationBuilder.NodeBuilderDefinedContext defined = null;
            for (int i = 1; i < names.size(); i++) {
                Integer previous = indices.get(i - 1);
                if (previous != null) {
                    defined = (defined == null ? node.addPropertyNode(names.get(i)) : defined.addPropertyNode(names.get(i)))
                            .inIterable().atIndex(previous);
                    node = null;
                } else {
                    node = defined == null ? node.addPropertyNode(names.get(i)) : defined.addPropertyNode(names.get(i));
                    defined = null;
                }
            }
            Integer last = indices.get(indices.size() - 1);
            if (last != null) {
                (defined == null ? node.addBeanNode() : defined.addBeanNode()).inIterable().atIndex(last)
                        .addConstraintViolation();
            } else if (defined != null) {
                defined.addConstraintViolation();
            } else {
                node.addConstraintViolation();
            }
        }

        private static String escape(String message) {
            return message.replace("\\", "\\\\").replace("{", "\\{").replace("}", "\\}").replace("$", "\\$");
        }
    }
}
