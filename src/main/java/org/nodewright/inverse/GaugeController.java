package org.nodewright.inverse;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.inverse.GaugePicker;
import org.nodewright.physics.inverse.GaugeStock;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.strings.StressCheck;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.NoteNames;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Inverse design for strings: the gauge that gives each string its target tension at its pitch. */
@RestController
@Tag(name = "Inverse design", description = "Gauges for target tensions; tone-hole positions for target notes")
class GaugeController {

    private static final double INCH_MM = 25.4;

    @PostMapping(path = "/api/v1/inverse/gauges", consumes = "application/json")
    @Operation(summary = "Pick gauges for a target tension profile (or one string's gauge for one tension)",
            description = "Each string: note (\"E4\") or targetHz, targetTensionN (or the set's tensionProfile), "
                    + "material id (GET /api/v1/materials), optional wrapMaterial for a wound string and coreRatio "
                    + "(core/outer diameter, default 0.40). Gauges come from availableGaugesMm when given (outer "
                    + "diameters), else the workshop stock list. Tension by Mersenne's law T = mu (2 L f)^2.")
    GaugeResponse pick(@Valid @RequestBody GaugeRequest request) {
        List<FieldProblem> problems = new ArrayList<>();
        double a4 = request.referenceA4Hz() == null ? EqualTemperament.ISO_16_A4_HZ : request.referenceA4Hz();
        List<GaugePicker.Target> targets = new ArrayList<>();
        int n = request.strings().size();
        for (int i = 0; i < n; i++) {
            GaugeRequest.StringTarget s = request.strings().get(i);
            String at = "strings[" + i + "].";
            Double hz = s.targetHz();
            if ((hz == null) == (s.note() == null)) {
                problems.add(new FieldProblem(at + "targetHz", "give either note or targetHz"));
            } else if (hz == null) {
                try {
                    hz = NoteNames.frequencyHz(s.note(), a4);
                } catch (IllegalArgumentException e) {
                    problems.add(new FieldProblem(at + "note", "is not a note name like E4, F#3 or Bb2"));
                }
            }
            Double tension = s.targetTensionN();
            if (tension == null && request.tensionProfile() != null) {
                double w = n == 1 ? 0 : (double) i / (n - 1);
                tension = request.tensionProfile().firstN() * (1 - w) + request.tensionProfile().lastN() * w;
            }
            if (tension == null) {
                problems.add(new FieldProblem(at + "targetTensionN", "is required without a tensionProfile"));
            }
            Material core = Materials.find(s.material()).orElse(null);
            if (core == null) {
                problems.add(new FieldProblem(at + "material", "is not a material id of GET /api/v1/materials"));
            }
            Material wrap = null;
            if (s.wrapMaterial() != null) {
                wrap = Materials.find(s.wrapMaterial()).orElse(null);
                if (wrap == null) {
                    problems.add(new FieldProblem(at + "wrapMaterial", "is not a material id of GET /api/v1/materials"));
                }
            }
            if (problems.isEmpty()) {
                double length = (s.lengthMm() == null ? request.lengthMm() : s.lengthMm()) * 1e-3;
                targets.add(new GaugePicker.Target(length, hz, tension, core, wrap,
                        s.coreRatio() == null ? GaugePicker.DEFAULT_CORE_RATIO : s.coreRatio()));
            }
        }
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
        List<GaugeResponse.StringPick> picks = new ArrayList<>();
        double total = 0;
        for (GaugePicker.Target t : targets) {
            List<Double> gauges = request.availableGaugesMm() == null ? GaugeStock.gaugesM(t.core(), t.wound())
                    : request.availableGaugesMm().stream().map(mm -> mm * 1e-3).toList();
            GaugePicker.Pick p = GaugePicker.pick(t, gauges);
            total += p.choice().tensionN();
            picks.add(GaugeResponse.StringPick.of(p));
        }
        return new GaugeResponse(picks, total, StressCheck.CAUTION);
    }

    record GaugeResponse(List<StringPick> strings, double totalTensionN, String caution) {

        record Neighbour(double outerDiameterMm, double tensionN) {
            static Neighbour of(GaugePicker.Option o) {
                return o == null ? null : new Neighbour(o.outerDiameterM() * 1e3, o.tensionN());
            }
        }

        record StringPick(double targetHz, double targetTensionN, boolean wound, Double diameterMm, Double diameterIn,
                double outerDiameterMm, double outerDiameterIn, Double coreDiameterMm, Double wrapDiameterMm,
                double linearDensityKgPerM, double tensionN, double offPct, double exactDiameterMm,
                double stressPa, double stressPct, Neighbour thinner, Neighbour thicker, List<String> warnings) {

            static StringPick of(GaugePicker.Pick p) {
                var c = p.choice().construction();
                double outerMm = p.choice().outerDiameterM() * 1e3;
                boolean wound = p.target().wound();
                return new StringPick(p.target().frequencyHz(), p.target().tensionN(), wound,
                        wound ? null : outerMm, wound ? null : outerMm / INCH_MM, outerMm, outerMm / INCH_MM,
                        wound ? c.coreDiameterM() * 1e3 : null, wound ? c.wrapDiameterM() * 1e3 : null,
                        c.linearDensityKgPerM(), p.choice().tensionN(), 100 * p.offFraction(),
                        p.exactDiameterM() * 1e3, p.stress().stressPa(), 100 * p.stress().fractionOfStrength(),
                        Neighbour.of(p.thinner()), Neighbour.of(p.thicker()), p.stress().warnings());
            }
        }
    }
}
