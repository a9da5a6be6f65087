package org.nodewright.web;

import jakarta.validation.Constraint;
import jakarta.validation.Payload;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * A sounding length in millimetres as requests take it (a string's scale length, its own length in
 * a set, a fret scale): finite, 1 mm to 100 m. Each part reports its own message, exactly as the
 * three constraints written out did ("must be at least 1 mm", "must be at most 100000 mm").
 */
@Finite
@DecimalMin(value = "1", message = "must be at least 1 mm")
@DecimalMax(value = "100000", message = "must be at most 100000 mm")
@Target({ElementType.FIELD, ElementType.PARAMETER, ElementType.RECORD_COMPONENT, ElementType.TYPE_USE,
    ElementType.METHOD, ElementType.ANNOTATION_TYPE})
@Retention(RetentionPolicy.RUNTIME)
@Constraint(validatedBy = {})
@Documented
public @interface LengthMm {

    String message() default "must be a length from 1 to 100000 mm";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};
}
