package org.nodewright.plates;

import java.util.List;
import org.nodewright.physics.plates.ElasticFit;

/**
 * Answer of {@code POST /api/v1/plates/measure}: the sample's fitted constants (SI, x along the grain) ready for the
 * plate bench's five material fields, the closed-form first estimates, each mode measured against the fitted model,
 * and the speeds of sound √(E/ρ) along and across that makers compare boards by.
 */
record PlateMeasureResponse(double densityKgPerM3, double elasticAlongPa, double elasticAcrossPa, double shearPa,
        double poissonAlongAcross, ClosedForm closedForm, List<Mode> modes, double soundSpeedAlongMPerS,
        double soundSpeedAcrossMPerS, String method, List<String> cautions) {

    /** The closed-form estimates (McIntyre &amp; Woodhouse's starting relations) before the model fit. */
    record ClosedForm(double elasticAlongPa, double elasticAcrossPa, double shearPa) {
    }

    /**
     * One measured mode: which it is, the frequency measured (and which peak, from 0, when they came unnamed), the
     * fitted model's frequency, the difference in cents, and how like the ideal shape the model's mode is (0..1).
     */
    record Mode(ElasticFit.Kind kind, double measuredHz, Integer peakIndex, double computedHz, double cents,
            double shapeMatch) {
    }
}
