package org.nodewright.aircolumns;

import static org.assertj.core.api.Assertions.assertThat;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.OutputEnd;

/** The request record validates itself: every problem is found without the web layer. */
class AirColumnRequestValidationTest {

    static final Validator VALIDATOR = Validation.buildDefaultValidatorFactory().getValidator();

    static AirColumnRequest.Segment seg(double len, double d1, double d2) {
        return new AirColumnRequest.Segment(len, d1, d2);
    }

    static Set<String> paths(AirColumnRequest r) {
        return VALIDATOR.validate(r).stream().map(ConstraintViolation::getPropertyPath).map(Object::toString)
                .collect(Collectors.toSet());
    }

    @Test
    void aSoundDesignHasNoViolations() {
        AirColumnRequest r = new AirColumnRequest(List.of(seg(300.0, 15.0, 15.0)), InputEnd.CLOSED,
                OutputEnd.OPEN_UNFLANGED, List.of(new AirColumnRequest.Hole(200.0, 6.0, 3.0, true)), 20.0, 0.0,
                true, 20.0, 3000.0, 4000, 440.0, null, List.of(new AirColumnRequest.FingeringSpec("low", List.of(0),
                        "D4", null, 1)));
        assertThat(paths(r)).isEmpty();
    }

    @Test
    void everyProblemIsReportedWithItsDottedPath() {
        AirColumnRequest r = new AirColumnRequest(
                List.of(seg(100.0, 15.0, 15.0), seg(100.0, 15.0, 12.0), seg(-5.0, 12.0, Double.NaN)),
                null, OutputEnd.CLOSED,
                List.of(new AirColumnRequest.Hole(50.0, 20.0, 3.0, true), new AirColumnRequest.Hole(150.0, 6.0, -1.0,
                        false)),
                900.0, -3.0, null, 3000.0, 20.0, 1_000_000_000, Double.POSITIVE_INFINITY, 1, List.of(
                        new AirColumnRequest.FingeringSpec(null, List.of(5), null, null, 0)));
        assertThat(paths(r)).contains("segments[2].lengthMm", "segments[2].outputDiameterMm", "inputEnd",
                "holes[1].chimneyMm", "temperatureC", "relativeHumidityPct", "points", "referenceA4Hz",
                "profileSamples", "fMaxHz", "fingerings[0].register", "fingerings[0].targetHz");
    }

    @Test
    void crossFieldRulesNameTheirFields() {
        AirColumnRequest r = new AirColumnRequest(List.of(seg(100.0, 15.0, 15.0), seg(100.0, 15.0, 10.0)),
                InputEnd.OPEN, OutputEnd.IDEAL_OPEN,
                List.of(new AirColumnRequest.Hole(50.0, 16.0, 3.0, true), new AirColumnRequest.Hole(250.0, 4.0, 3.0,
                        true)),
                null, null, null, 100.0, 100.0, null, null, null,
                List.of(new AirColumnRequest.FingeringSpec("x", List.of(0, 7), "Q#9", null, null)));
        assertThat(paths(r)).containsExactlyInAnyOrder("holes[0].diameterMm", "holes[1].positionMm", "fMaxHz",
                "fingerings[0].closedHoles[1]", "fingerings[0].targetNote");
    }

    @Test
    void requestsAskingForUnboundedWorkAreRefused() {
        List<AirColumnRequest.Segment> many = java.util.Collections.nCopies(1000, seg(20.0, 15.0, 15.0));
        List<AirColumnRequest.FingeringSpec> fs = java.util.Collections.nCopies(32,
                new AirColumnRequest.FingeringSpec(null, List.of(), null, 440.0, 1));
        AirColumnRequest r = new AirColumnRequest(many, InputEnd.CLOSED, OutputEnd.CLOSED, null, null, null,
                null, 20.0, 20000.0, 20000, null, null, fs);
        assertThat(paths(r)).contains("points");
    }
}
