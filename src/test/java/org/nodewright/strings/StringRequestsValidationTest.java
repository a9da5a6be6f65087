package org.nodewright.strings;

import static org.assertj.core.api.Assertions.assertThat;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.strings.EndCondition;
import org.nodewright.physics.strings.PickupCombination;

/**
 * The request records validate themselves with Bean Validation alone (no Spring), cross-field rules
 * included, so other features (the design store) can check saved parameters with the same rules.
 */
class StringRequestsValidationTest {

    private static final Validator VALIDATOR = Validation.buildDefaultValidatorFactory().getValidator();

    private static StringAnalysisRequest request(Double tension, Double target, String material,
            List<StringAnalysisRequest.Pickup> pickups, PickupCombination combination, Double pluckMm) {
        return new StringAnalysisRequest(650.0, tension, target, null, material, 0.30, null, null, null,
                EndCondition.CLAMPED, true, 24, pluckMm == null ? null : new StringAnalysisRequest.Pluck(pluckMm, null),
                pickups, combination, null, null);
    }

    private static List<String> paths(Set<? extends ConstraintViolation<?>> violations) {
        return violations.stream().map(v -> v.getPropertyPath().toString()).sorted().toList();
    }

    @Test
    void aConsistentRequestHasNoViolations() {
        StringAnalysisRequest r = request(70.0, null, "plain-steel",
                List.of(new StringAnalysisRequest.Pickup(150.0, 10.0), new StringAnalysisRequest.Pickup(600.0, null)),
                PickupCombination.SUM, 120.0);
        assertThat(VALIDATOR.validate(r)).isEmpty();
    }

    @Test
    void crossFieldProblemsAreViolationsOnTheirDottedPaths() {
        StringAnalysisRequest r = request(70.0, 330.0, "unobtainium",
                List.of(new StringAnalysisRequest.Pickup(5.0, 40.0)), PickupCombination.OPPOSITE, 650.0);
        assertThat(paths(VALIDATOR.validate(r))).containsExactly("material", "pickupCombination",
                "pickups[0].apertureMm", "pluck.positionMm", "targetHz");
    }

    @Test
    void singleFieldAndCrossFieldProblemsTogether() {
        StringAnalysisRequest r = new StringAnalysisRequest(Double.NaN, null, null, null, null, null, null, 0.2,
                null, null, true, 1_000_000_000, null, null, null, null, null);
        assertThat(paths(VALIDATOR.validate(r))).contains("lengthMm", "tensionN", "material", "diameterMm",
                "wrapMaterial", "youngsModulusPa", "modeCount");
    }

    @Test
    void stringSetRequestValidatesItself() {
        StringSetRequest r = new StringSetRequest(null, null, null, null, List.of(
                new StringSetRequest.Member("high E", 329.63, "plain-steel", 0.25, null, null, null),
                new StringSetRequest.Member(null, 82.41, "plain-steel", 0.40, "tin", null, 660.0)));
        assertThat(paths(VALIDATOR.validate(r))).containsExactly("strings[0].lengthMm", "strings[1].wrapDiameterMm",
                "strings[1].wrapMaterial");
    }
}
