package org.nodewright.plates;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.plates.PlateMaterial;
import org.nodewright.physics.plates.PlateMaterials;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Body of {@code POST /api/v1/plates/measure}: a rectangular sample cut with x along the grain, its size (mm),
 * its mass (g) or density, and the tapped frequencies of the free plate, named (twistingHz, alongHz, acrossHz) or as
 * unnamed peaks of a recording (peaksHz, matched to the modes the start material predicts). The start material
 * (default spruce) gives Poisson's ratio unless it is sent and the constants of any mode not measured.
 */
@CrossFieldChecked
public record PlateMeasureRequest(
        @NotNull @Finite @DecimalMin(value = "10", message = "must be at least 10 mm")
        @DecimalMax(value = "3000", message = "must be at most 3000 mm") Double lengthMm,
        @NotNull @Finite @DecimalMin(value = "10", message = "must be at least 10 mm")
        @DecimalMax(value = "3000", message = "must be at most 3000 mm") Double widthMm,
        @NotNull @Finite @DecimalMin(value = "0.2", message = "must be at least 0.2 mm")
        @DecimalMax(value = "60", message = "must be at most 60 mm") Double thicknessMm,
        @Finite @DecimalMin(value = "0", inclusive = false, message = "must be more than 0 g")
        @DecimalMax(value = "100000", message = "must be at most 100000 g") Double massG,
        @Finite @DecimalMin(value = "10", message = "must be at least 10 kg/m3")
        @DecimalMax(value = "30000", message = "must be at most 30000 kg/m3") Double densityKgPerM3,
        @Size(max = 64) String material,
        @Finite @DecimalMin(value = "-0.9", message = "must be at least -0.9")
        @DecimalMax(value = "0.9", message = "must be at most 0.9") Double poissonAlongAcross,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
        @DecimalMax(value = "20000", message = "must be at most 20000 Hz") Double twistingHz,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
        @DecimalMax(value = "20000", message = "must be at most 20000 Hz") Double alongHz,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
        @DecimalMax(value = "20000", message = "must be at most 20000 Hz") Double acrossHz,
        @Size(max = MAX_PEAKS) List<@NotNull @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
                @DecimalMax(value = "20000", message = "must be at most 20000 Hz") Double> peaksHz)
        implements CrossFieldChecked.Rules {

    public static final int MAX_PEAKS = 40;
    static final String DEFAULT_MATERIAL = "spruce";

    String materialOrDefault() {
        return material == null ? DEFAULT_MATERIAL : material;
    }

    PlateMaterial start() {
        return PlateMaterials.byId(materialOrDefault()).orElseThrow().material();
    }

    /** kg/m³: the density sent, or the mass over the sample's volume. */
    double density() {
        return densityKgPerM3 != null ? densityKgPerM3 : massG * 1e-3 / (lengthMm * widthMm * thicknessMm * 1e-9);
    }

    double poisson() {
        return poissonAlongAcross != null ? poissonAlongAcross : start().poissonAlongAcross();
    }

    boolean named() {
        return twistingHz != null || alongHz != null || acrossHz != null;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if ((massG == null) == (densityKgPerM3 == null)) {
            out.add(new FieldProblem("massG", "give either the sample's massG or its densityKgPerM3"));
        }
        if (material != null && PlateMaterials.byId(material).isEmpty()) {
            out.add(new FieldProblem("material", "is not a known plate material (see GET /api/v1/plate-materials)"));
        }
        boolean peaks = peaksHz != null && !peaksHz.isEmpty();
        if (named() && peaks) {
            out.add(new FieldProblem("peaksHz", "give either the named frequencies or the unnamed peaks, not both"));
        } else if (!named() && !peaks) {
            out.add(new FieldProblem("twistingHz",
                    "is required: give twistingHz, alongHz, acrossHz (any of them) or the peaksHz of a recording"));
        }
        return out;
    }
}
