package org.nodewright.bars;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.bars.BarMaterial;
import org.nodewright.physics.bars.BarMaterials;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** JSON API of the bar bench: the analysis and the materials catalogue. */
@RestController
@Tag(name = "Bars")
class BarsApiController {

    private final BarAnalysisService analysis;

    BarsApiController(BarAnalysisService analysis) {
        this.analysis = analysis;
    }

    @PostMapping(path = "/api/v1/bars/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Bending (and twisting, lateral) modes of a bar, rod, tube or tine",
            description = "Body: lengthMm, section (rectangle: widthMm, thicknessMm or a piecewise-linear profile "
                    + "[{positionMm, thicknessMm}] covering 0..lengthMm; round: diameterMm; tube: diameterMm, boreMm), "
                    + "material (GET /api/v1/bar-materials) or densityKgPerM3 + youngsModulusPa + shearModulusPa, ends "
                    + "(free-free, clamped-free, pinned-pinned, clamped-clamped), theory (timoshenko, euler-bernoulli), "
                    + "modeCount (1..16). Finite elements: cubic Hermite (Euler-Bernoulli) or four-node cubic Lagrange "
                    + "with reduced shear integration (Timoshenko, Cowper's shear coefficient, reported as "
                    + "shearCoefficient); Saint-Venant twisting. modes: the modeCount bending modes ascending (kind "
                    + "bending), then twisting and lateral-bending modes up to the highest of them. Positions in mm "
                    + "from x = 0; nodes by root finding on the element interpolation; max |shape| = 1.")
    BarAnalysisResponse analyze(@Valid @RequestBody BarAnalysisRequest request) {
        return analysis.analyze(request);
    }

    @Operation(summary = "Bar materials: density, Young's modulus along the bar, shear modulus and a source each")
    @GetMapping(path = "/api/v1/bar-materials", produces = MediaType.APPLICATION_JSON_VALUE)
    List<MaterialJson> materials() {
        return BarMaterials.all().stream().map(MaterialJson::of).toList();
    }

    /** One catalogue entry. */
    record MaterialJson(String id, String name, double densityKgPerM3, double youngsModulusPa, double shearModulusPa,
            boolean wood, String source) {
        static MaterialJson of(BarMaterial m) {
            return new MaterialJson(m.id(), m.name(), m.density(), m.youngsModulus(), m.shearModulus(), m.isWood(),
                    m.source());
        }
    }
}
