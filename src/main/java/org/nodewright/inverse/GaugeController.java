package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM_PER_INCH;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.inverse.GaugePicker;
import org.nodewright.physics.inverse.GaugeStock;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.Materials;
import org.nodewright.strings.StressWording;
import org.nodewright.strings.StringRules;
import org.nodewright.web.FieldProblem;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Inverse design for strings: the gauge that gives each string its target tension at its pitch. */
@RestController
@Tag(name = "Inverse design", description = "Gauges for target tensions; tone-hole positions for target notes")
class GaugeController {

    private final StressWording wording;

    GaugeController(StressWording wording) {
        this.wording = wording;
    }

    @PostMapping(path = "/api/v1/inverse/gauges", consumes = "application/json")
    @Operation(summary = "Pick gauges for a target tension profile (or one string's gauge for one tension)",
            description = "Each string: note (\"E4\") or targetHz, targetTensionN (or the set's tensionProfile), "
                    + "material id (GET /api/v1/materials), optional wrapMaterial for a wound string and coreRatio "
                    + "(core/outer diameter, default 0.40). Gauges come from availableGaugesMm when given (outer "
                    + "diameters), else the workshop stock list. Tension by Mersenne's law T = mu (2 L f)^2.")
    GaugeResponse pick(@Valid @RequestBody GaugeRequest request) {
        double a4 = request.referenceA4OrDefault();
        List<GaugePicker.Target> targets = new ArrayList<>();
        int n = request.strings().size();
        for (int i = 0; i < n; i++) {
            GaugeRequest.StringTarget s = request.strings().get(i);
            double hz = StringRules.pitchHz(s.note(), s.targetHz(), a4);
            Double tension = s.targetTensionN();
            if (tension == null) {
                double w = n == 1 ? 0 : (double) i / (n - 1);
                tension = request.tensionProfile().firstN() * (1 - w) + request.tensionProfile().lastN() * w;
            }
            Material core = Materials.get(s.material());
            Material wrap = s.wrapMaterial() == null ? null : Materials.get(s.wrapMaterial());
            double length = (s.lengthMm() == null ? request.lengthMm() : s.lengthMm()) * 1e-3;
            targets.add(new GaugePicker.Target(length, hz, tension, core, wrap,
                    s.coreRatio() == null ? GaugePicker.DEFAULT_CORE_RATIO : s.coreRatio()));
        }
        List<GaugeResponse.StringPick> picks = new ArrayList<>();
        double total = 0;
        for (GaugePicker.Target t : targets) {
            List<Double> gauges = request.availableGaugesMm() == null ? GaugeStock.gaugesM(t.core(), t.wound())
                    : request.availableGaugesMm().stream().map(mm -> mm * 1e-3).toList();
            GaugePicker.Pick p = GaugePicker.pick(t, gauges);
            total += p.choice().tensionN();
            picks.add(GaugeResponse.StringPick.of(p, wording.warnings(p.stress())));
        }
        return new GaugeResponse(picks, total, wording.caution());
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

            static StringPick of(GaugePicker.Pick p, List<String> stressWarnings) {
                var c = p.choice().construction();
                double outerMm = p.choice().outerDiameterM() * 1e3;
                boolean wound = p.target().wound();
                return new StringPick(p.target().frequencyHz(), p.target().tensionN(), wound,
                        wound ? null : outerMm, wound ? null : outerMm / MM_PER_INCH, outerMm, outerMm / MM_PER_INCH,
                        wound ? c.coreDiameterM() * 1e3 : null, wound ? c.wrapDiameterM() * 1e3 : null,
                        c.linearDensityKgPerM(), p.choice().tensionN(), 100 * p.offFraction(),
                        p.exactDiameterM() * 1e3, p.stress().stressPa(), 100 * p.stress().fractionOfStrength(),
                        Neighbour.of(p.thinner()), Neighbour.of(p.thicker()), warnings(p, outerMm, stressWarnings));
            }

            /**
             * The stress warnings, and one when the closest gauge on offer misses the target
             * tension by more than {@link #OFF_TARGET_PCT} (a stock list without the gauge needed).
             */
            private static List<String> warnings(GaugePicker.Pick p, double outerMm, List<String> stressWarnings) {
                List<String> out = new ArrayList<>(stressWarnings);
                double offPct = 100 * p.offFraction();
                if (Math.abs(offPct) > OFF_TARGET_PCT) {
                    out.add(String.format(java.util.Locale.ROOT, "the nearest gauge on offer (%s mm) gives %s N, %s %% %s "
                            + "the target %s N: the gauge needed is about %s mm; add it to the list or choose another "
                            + "material", FieldProblem.figure(outerMm), FieldProblem.figure(p.choice().tensionN()),
                            FieldProblem.figure(Math.abs(Math.round(offPct * 10) / 10.0)), offPct < 0 ? "below" : "above",
                            FieldProblem.figure(p.target().tensionN()), FieldProblem.figure(p.exactDiameterM() * 1e3)));
                }
                return List.copyOf(out);
            }
        }
    }

    /**
     * How far from the target tension a picked gauge may land before the answer warns: 10 %
     * (common practice: the strings of a balanced set sit within about a tenth of each other's feel).
     */
    static final double OFF_TARGET_PCT = 10;
}
