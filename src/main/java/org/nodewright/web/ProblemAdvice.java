package org.nodewright.web;

import jakarta.validation.ConstraintViolationException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.context.MessageSourceResolvable;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.HttpStatusCode;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.validation.FieldError;
import org.springframework.web.ErrorResponseException;
import org.springframework.web.bind.MethodArgumentNotValidException;
import org.springframework.web.bind.MissingServletRequestParameterException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.context.request.WebRequest;
import org.springframework.web.method.annotation.HandlerMethodValidationException;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.multipart.support.MissingServletRequestPartException;
import org.springframework.web.servlet.mvc.method.annotation.ResponseEntityExceptionHandler;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.exc.StreamReadException;

/**
 * Every bad request becomes an RFC 9457 problem document with an {@code errors} array of
 * {@code {field, message}}, the field as a dotted path ({@code segments[2].lengthMm}). No stack
 * trace ever leaves the server.
 */
@RestControllerAdvice
public class ProblemAdvice extends ResponseEntityExceptionHandler {

    private static final Logger log = LoggerFactory.getLogger(ProblemAdvice.class);

    /** Builds a 400 problem document from field problems; also used by controllers and filters. */
    public static ProblemDetail badRequest(String detail, List<FieldProblem> problems) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.BAD_REQUEST, detail);
        pd.setTitle("Invalid request");
        List<FieldProblem> sorted = new ArrayList<>(problems);
        sorted.sort(Comparator.comparing(FieldProblem::field));
        pd.setProperty("errors", sorted);
        return pd;
    }

    @Override
    protected ResponseEntity<Object> handleMethodArgumentNotValid(MethodArgumentNotValidException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        List<FieldProblem> problems = new ArrayList<>();
        for (FieldError fe : ex.getBindingResult().getFieldErrors()) {
            problems.add(new FieldProblem(fe.getField(), message(fe)));
        }
        ex.getBindingResult().getGlobalErrors()
                .forEach(ge -> problems.add(new FieldProblem(ge.getObjectName(), message(ge))));
        return problem(badRequest("One or more fields are invalid.", problems), headers);
    }

    @Override
    protected ResponseEntity<Object> handleHandlerMethodValidationException(HandlerMethodValidationException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        List<FieldProblem> problems = new ArrayList<>();
        ex.getParameterValidationResults().forEach(result -> {
            String name = result.getMethodParameter().getParameterName();
            result.getResolvableErrors().forEach(err -> {
                String field = name;
                if (err instanceof FieldError fe) {
                    field = fe.getField();
                }
                problems.add(new FieldProblem(field, message(err)));
            });
        });
        return problem(badRequest("One or more parameters are invalid.", problems), headers);
    }

    @Override
    protected ResponseEntity<Object> handleHttpMessageNotReadable(HttpMessageNotReadableException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        String field = "body";
        String message = "the request body is missing or is not valid JSON";
        Throwable cause = ex.getMostSpecificCause();
        if (cause instanceof JacksonException je) {
            String path = jsonPath(je);
            if (!path.isEmpty()) {
                field = path;
            }
            message = readableMessage(je);
        }
        return problem(badRequest("The request body could not be read.", List.of(new FieldProblem(field, message))),
                headers);
    }

    @Override
    protected ResponseEntity<Object> handleMissingServletRequestParameter(MissingServletRequestParameterException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        return problem(badRequest("A required parameter is missing.",
                List.of(new FieldProblem(ex.getParameterName(), "is required"))), headers);
    }

    @Override
    protected ResponseEntity<Object> handleMissingServletRequestPart(MissingServletRequestPartException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        return problem(badRequest("A required part is missing.",
                List.of(new FieldProblem(ex.getRequestPartName(), "is required"))), headers);
    }

    @Override
    protected ResponseEntity<Object> handleMaxUploadSizeExceededException(MaxUploadSizeExceededException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        return problem(badRequest("The upload is too large.",
                List.of(new FieldProblem("file", "is larger than the upload limit"))), headers);
    }

    @ExceptionHandler(MethodArgumentTypeMismatchException.class)
    ResponseEntity<Object> typeMismatch(MethodArgumentTypeMismatchException ex) {
        return problem(badRequest("A parameter has the wrong type.",
                List.of(new FieldProblem(ex.getName(), "is not a valid value: " + abbreviate(ex.getValue())))),
                new HttpHeaders());
    }

    @ExceptionHandler(ConstraintViolationException.class)
    ResponseEntity<Object> constraintViolation(ConstraintViolationException ex) {
        List<FieldProblem> problems = ex.getConstraintViolations().stream()
                .map(v -> new FieldProblem(lastNode(v.getPropertyPath().toString()), v.getMessage()))
                .toList();
        return problem(badRequest("One or more fields are invalid.", problems), new HttpHeaders());
    }

    @ExceptionHandler(BadRequestException.class)
    ResponseEntity<Object> badRequest(BadRequestException ex) {
        return problem(badRequest("One or more fields are invalid.", ex.problems()), new HttpHeaders());
    }

    /**
     * Safety net: a core precondition that validation at the edge missed. Still a 400, never a 500,
     * but logged, since the edge should have caught it with a field name.
     */
    @ExceptionHandler(IllegalArgumentException.class)
    ResponseEntity<Object> illegalArgument(IllegalArgumentException ex) {
        log.warn("Core rejected input that validation let through: {}", ex.getMessage());
        return problem(badRequest("The request cannot be computed.",
                List.of(new FieldProblem("request", ex.getMessage() == null ? "invalid" : ex.getMessage()))),
                new HttpHeaders());
    }

    @ExceptionHandler(Exception.class)
    ResponseEntity<Object> unexpected(Exception ex) throws Exception {
        if (ex instanceof org.springframework.security.access.AccessDeniedException
                || ex instanceof org.springframework.security.core.AuthenticationException) {
            throw ex; // the security filter chain answers these with 401/403
        }
        if (org.nodewright.store.DiskSpace.isDiskFull(ex)) {
            log.error("A write failed for lack of disk space: {}", ex.getMessage());
            ErrorResponseException full = org.nodewright.store.DiskSpace.full("The disk of the data directory is "
                    + "full: this change was not saved. Everything saved before is kept; free some space and save again.");
            return problem(full.getBody(), new HttpHeaders());
        }
        log.error("Unexpected failure", ex);
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.INTERNAL_SERVER_ERROR,
                "The server could not complete the request.");
        pd.setTitle("Internal error");
        return problem(pd, new HttpHeaders());
    }

    private static ResponseEntity<Object> problem(ProblemDetail pd, HttpHeaders headers) {
        return ResponseEntity.status(pd.getStatus()).headers(headers)
                .contentType(org.springframework.http.MediaType.APPLICATION_PROBLEM_JSON).body(pd);
    }

    private static String message(MessageSourceResolvable err) {
        return err.getDefaultMessage() == null ? "is invalid" : err.getDefaultMessage();
    }

    /** Dotted path of a Jackson failure: {@code segments[2].lengthMm}. */
    public static String jsonPath(JacksonException je) {
        StringBuilder sb = new StringBuilder();
        List<JacksonException.Reference> path = je.getPath();
        if (je instanceof StreamReadException sre && sre.processor() != null) {
            // A token-level error (NaN, truncated body): the parser still knows where it was, down to
            // the property (the reference path stops at the enclosing list element).
            String dotted = pointerToDotted(sre.processor().streamReadContext().pathAsPointer().toString());
            if (!dotted.isEmpty() || path.isEmpty()) {
                return dotted;
            }
        }
        for (JacksonException.Reference ref : path) {
            if (ref.getPropertyName() != null) {
                if (!sb.isEmpty()) {
                    sb.append('.');
                }
                sb.append(ref.getPropertyName());
            } else if (ref.getIndex() >= 0) {
                sb.append('[').append(ref.getIndex()).append(']');
            }
        }
        return sb.toString();
    }

    private static String pointerToDotted(String pointer) {
        if (pointer == null || pointer.isEmpty() || "/".equals(pointer)) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        for (String part : pointer.substring(1).split("/")) {
            if (part.chars().allMatch(Character::isDigit) && !part.isEmpty()) {
                sb.append('[').append(part).append(']');
            } else {
                if (!sb.isEmpty()) {
                    sb.append('.');
                }
                sb.append(part.replace("~1", "/").replace("~0", "~"));
            }
        }
        return sb.toString();
    }

    /** A short message for a Jackson failure, free of class names; also used for saved-design parameters. */
    public static String readableMessage(JacksonException je) {
        if (je instanceof tools.jackson.databind.exc.InvalidFormatException ife && ife.getTargetType() != null
                && ife.getTargetType().isEnum()) {
            return "is not one of " + enumWords(ife.getTargetType());
        }
        if (je instanceof tools.jackson.databind.exc.MismatchedInputException mie && isNumber(mie.getTargetType())) {
            // Text, a boolean or a list where a number belongs: say what to enter, not how Jackson coerces.
            return "enter a number (in JSON, without quotes)";
        }
        String m = je.getOriginalMessage();
        if (m == null) {
            return "is not readable";
        }
        if (m.startsWith("Non-standard token")) {
            return "must be a finite number (NaN and Infinity are not accepted)";
        }
        int cut = m.indexOf('\n');
        m = cut > 0 ? m.substring(0, cut) : m;
        // Keep it short and free of class names.
        m = m.replaceAll("\\(class [^)]*\\)", "").replaceAll("`[a-z]+(\\.[A-Za-z0-9_$]+)+`", "value");
        return m.length() > 200 ? m.substring(0, 200) : m;
    }

    private static boolean isNumber(Class<?> type) {
        return type != null && (Number.class.isAssignableFrom(type) || type == double.class || type == float.class
                || type == int.class || type == long.class || type == short.class);
    }

    /**
     * The words an enum accepts in JSON: a core enum's {@link EnumWords}; otherwise each constant's
     * {@code @JsonProperty} value, else its name.
     */
    static java.util.List<String> enumWords(Class<?> type) {
        if (EnumWords.isCoreEnum(type)) {
            return EnumWords.words(type);
        }
        List<String> words = new ArrayList<>();
        for (java.lang.reflect.Field f : type.getFields()) {
            if (!f.isEnumConstant()) {
                continue;
            }
            com.fasterxml.jackson.annotation.JsonProperty jp =
                    f.getAnnotation(com.fasterxml.jackson.annotation.JsonProperty.class);
            words.add(jp != null && !jp.value().isEmpty() ? jp.value() : f.getName());
        }
        return words;
    }

    private static String lastNode(String propertyPath) {
        int dot = propertyPath.indexOf('.');
        return dot >= 0 ? propertyPath.substring(dot + 1) : propertyPath;
    }

    private static String abbreviate(Object value) {
        String s = String.valueOf(value);
        return s.length() > 60 ? s.substring(0, 60) + "…" : s;
    }
}
