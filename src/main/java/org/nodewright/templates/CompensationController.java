package org.nodewright.templates;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.IdealString;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.strings.StringConstruction;
import org.nodewright.physics.templates.IntonationCompensation;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.strings.StringRules;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Saddle (and nut) compensation estimates per string of a set. */
@RestController
@Tag(name = "Templates")
class CompensationController {

    static final String MODEL = "Fretting stretch plus bending stiffness, setbacks by least squares over the frets, "
            + "after Varieschi & Gower, Am. J. Phys. 78, 47 (2010); stiffness factor of Fletcher, J. Acoust. Soc. Am. "
            + "36, 203 (1964).";
    static final List<String> ASSUMPTIONS = List.of(
            "Open tension from Mersenne's law T = mu (2 L f)^2 at the nominal scale length.",
            "The string runs straight from the nut to the crown of the fretted fret and on to the saddle; no finger "
                    + "pressure beyond contact, no friction at the fret (the stretch spreads over the whole string).",
            "Only the core carries the extra tension: dT = E A strain with the core's Young's modulus and area.",
            "String heights above the plane of the fret crowns: nutHeightMm at the nut; at the saddle "
                    + "2 x actionAt12thMm - nutHeightMm (a straight string).",
            "The player tunes the open string; each fret's error is measured from the open string's own pitch.",
            "Catalogue moduli are typical values: the string maker's data and a tuner on the real instrument decide.");

    @CrossFieldChecked
    record Request(
            @NotNull @Finite @Positive @DecimalMax("3000") Double lengthMm,
            @Min(1) @Max(36) Integer frets,
            @Finite @PositiveOrZero @DecimalMax("20") Double nutHeightMm,
            @NotNull @Finite @PositiveOrZero @DecimalMax("20") Double actionAt12thMm,
            Boolean compensateNut,
            @Finite @DecimalMin("300") @DecimalMax("600") Double referenceA4Hz,
            @NotEmpty @Size(max = 24) List<@Valid @NotNull StringSpec> strings) implements CrossFieldChecked.Rules {

        /** Nut height above the fret plane, 0.5 mm unless given (common practice). */
        double nutOrDefault() {
            return nutHeightMm == null ? 0.5 : nutHeightMm;
        }

        /** Saddle height for a straight string: 2 x action at the 12th fret - nut height. */
        double saddleHeightMm() {
            return 2 * actionAt12thMm - nutOrDefault();
        }

        @Override
        public List<FieldProblem> crossFieldProblems() {
            List<FieldProblem> out = new ArrayList<>();
            if (actionAt12thMm != null && Double.isFinite(actionAt12thMm) && Double.isFinite(nutOrDefault())
                    && saddleHeightMm() < 0) {
                out.add(new FieldProblem("actionAt12thMm", "must be at least half of nutHeightMm"));
            }
            if (strings == null) {
                return out;
            }
            for (int i = 0; i < strings.size(); i++) {
                StringSpec s = strings.get(i);
                if (s == null) {
                    continue;
                }
                String at = "strings[" + i + "].";
                StringRules.pitch(out, at, s.note(), s.targetHz());
                StringRules.material(out, at + "material", s.material());
                StringRules.wrap(out, at, s.wrapMaterial(), s.wrapDiameterMm());
            }
            return out;
        }
    }

    record StringSpec(
            @Size(max = StringRules.NOTE_MAX) String note,
            @Finite @Positive @DecimalMax("20000") Double targetHz,
            @NotNull @Size(max = 40) String material,
            @NotNull @Finite @Positive @DecimalMax("20") Double diameterMm,
            @Size(max = 40) String wrapMaterial,
            @Finite @Positive @DecimalMax("20") Double wrapDiameterMm,
            @Finite @Positive @DecimalMax("1e12") Double youngsModulusPa) {
    }

    record StringResult(double targetHz, double tensionN, double saddleSetbackMm, double nutSetbackMm,
            double saddleFromNutMm, Double uncompensatedCentsAt12th, double worstUncompensatedCents,
            double worstCompensatedCents, double[] compensatedCentsByFret) {
    }

    record Response(String model, List<String> assumptions, List<StringResult> strings) {
    }

    @PostMapping(path = "/api/v1/templates/compensation", consumes = "application/json")
    @Operation(summary = "Saddle (and optionally nut) compensation per string of a set",
            description = "Model and assumptions are returned with the figures. Each string: note or targetHz, "
                    + "material and diameterMm (core), optional wrapMaterial + wrapDiameterMm, optional youngsModulusPa.")
    Response compensate(@Valid @RequestBody Request r) {
        double nut = r.nutOrDefault();
        double saddle = r.saddleHeightMm();
        double a4 = r.referenceA4Hz() == null ? EqualTemperament.ISO_16_A4_HZ : r.referenceA4Hz();
        List<IntonationCompensation.Setup> setups = new ArrayList<>();
        List<Double> pitches = new ArrayList<>();
        for (StringSpec s : r.strings()) {
            double hz = StringRules.pitchHz(s.note(), s.targetHz(), a4);
            Material core = Materials.get(s.material());
            Material wrap = s.wrapMaterial() == null ? null : Materials.get(s.wrapMaterial());
            StringConstruction c = wrap == null ? StringConstruction.plain(core, s.diameterMm() * 1e-3)
                    : StringConstruction.wound(core, s.diameterMm() * 1e-3, wrap, s.wrapDiameterMm() * 1e-3);
            double e = s.youngsModulusPa() == null ? core.youngsModulusPa() : s.youngsModulusPa();
            double mu = c.linearDensityKgPerM();
            double tension = IdealString.tensionN(r.lengthMm() * 1e-3, mu, hz);
            double area = Math.PI * c.coreDiameterM() * c.coreDiameterM() / 4;
            double ei = e * StringConstruction.secondMomentOfArea(c.coreDiameterM());
            setups.add(new IntonationCompensation.Setup(r.lengthMm(), tension, mu, e, area, ei, nut, saddle,
                    r.frets() == null ? 12 : r.frets()));
            pitches.add(hz);
        }
        boolean bothEnds = Boolean.TRUE.equals(r.compensateNut());
        List<StringResult> out = new ArrayList<>();
        for (int i = 0; i < setups.size(); i++) {
            IntonationCompensation.Setup s = setups.get(i);
            IntonationCompensation.Result res = IntonationCompensation.solve(s, bothEnds);
            double worstUn = 0;
            for (double v : res.uncompensatedCents()) {
                worstUn = Math.max(worstUn, Math.abs(v));
            }
            Double at12 = res.uncompensatedCents().length >= 12 ? res.uncompensatedCents()[11] : null;
            out.add(new StringResult(pitches.get(i), s.openTensionN(), res.saddleSetbackMm(), res.nutSetbackMm(),
                    s.scaleLengthMm() + res.saddleSetbackMm(), at12, worstUn,
                    res.worstCompensated(), res.compensatedCents()));
        }
        return new Response(MODEL, ASSUMPTIONS, out);
    }
}
