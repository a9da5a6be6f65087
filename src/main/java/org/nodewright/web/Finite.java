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

/**
 * The number must be finite: neither NaN nor ±Infinity. {@code @Positive} alone lets NaN and
 * +Infinity through (JSON {@code 1e400} parses as Infinity), so every double input carries this.
 * A null passes; combine with {@code @NotNull} where the field is required.
 */
@Documented
@Target({ElementType.FIELD, ElementType.PARAMETER, ElementType.RECORD_COMPONENT, ElementType.TYPE_USE,
        ElementType.METHOD})
@Retention(RetentionPolicy.RUNTIME)
@Constraint(validatedBy = Finite.Validator.class)
public @interface Finite {

    String message() default "must be a finite number";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};

    /** Checks a {@link Double} or {@link Float}; other numbers are finite by construction. */
    class Validator implements ConstraintValidator<Finite, Number> {
        @Override
        public boolean isValid(Number value, ConstraintValidatorContext context) {
            if (value == null) {
                return true;
            }
            double d = value.doubleValue();
            return !Double.isNaN(d) && !Double.isInfinite(d);
        }
    }
}
