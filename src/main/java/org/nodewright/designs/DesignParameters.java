package org.nodewright.designs;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.ProblemAdvice;
import org.springframework.stereotype.Component;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Validation of a design's parameters: the JSON is read
 * into the analysis request of its kind with the app's strict JSON mapper and run through the Bean
 * Validator, exactly as the analysis endpoint would; each problem is reported under the given
 * prefix ({@code parameters.lengthMm}, {@code designs[2].parameters.segments[0].lengthMm}).
 */
@Component
public class DesignParameters {

    private final JsonMapper mapper;
    private final Validator validator;

    DesignParameters(JsonMapper mapper, Validator validator) {
        this.mapper = mapper;
        this.validator = validator;
    }

    /** Problems with the parameters of a design of this kind; empty when they are valid. */
    public List<FieldProblem> check(DesignKind kind, JsonNode parameters, String prefix) {
        if (parameters == null || parameters.isNull() || parameters.isMissingNode()) {
            return List.of(new FieldProblem(prefix, "is required"));
        }
        if (!parameters.isObject()) {
            return List.of(new FieldProblem(prefix, "must be a JSON object"));
        }
        Class<?> type = kind.requestClass();
        Object request;
        try {
            request = mapper.treeToValue(parameters, type);
        } catch (JacksonException e) {
            return List.of(new FieldProblem(join(prefix, ProblemAdvice.jsonPath(e)), ProblemAdvice.readableMessage(e)));
        } catch (IllegalArgumentException e) {
            return List.of(new FieldProblem(prefix, e.getMessage() == null ? "is invalid" : e.getMessage()));
        }
        List<FieldProblem> problems = new ArrayList<>();
        for (ConstraintViolation<Object> v : validator.validate(request)) {
            problems.add(new FieldProblem(join(prefix, v.getPropertyPath().toString()), v.getMessage()));
        }
        problems.sort(Comparator.comparing(FieldProblem::field));
        return problems;
    }

    private static String join(String prefix, String path) {
        if (path == null || path.isEmpty()) {
            return prefix;
        }
        return path.startsWith("[") ? prefix + path : prefix + "." + path;
    }
}
