package org.nodewright.strings;

import static org.nodewright.physics.Units.MM;

import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.strings.GaugeSolver;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.strings.PitchUnreachableException;
import org.nodewright.physics.strings.StressCheck;
import org.nodewright.physics.strings.StringConstruction;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.Note;
import org.nodewright.web.BadRequestException;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** The gauge (diameter) that gives a wanted tension at a wanted pitch. */
@RestController
class StringGaugeController {

    private final StressWording wording;

    StringGaugeController(StressWording wording) {
        this.wording = wording;
    }

    @PostMapping(path = "/api/v1/strings/gauge", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    GaugeJson gauge(@Valid @RequestBody StringGaugeRequest r) {
        Material core = Materials.get(r.material());
        double l = r.lengthMm() * MM;
        boolean wound = r.wrapMaterial() != null;
        Material wrap = wound ? Materials.get(r.wrapMaterial()) : null;
        double coreD = wound ? r.coreDiameterMm() * MM : 0;
        double guess = GaugeSolver.plainFlexibleDiameterM(wound ? wrap.densityKgPerM3() : core.densityKgPerM3(), l,
                r.targetHz(), r.tensionN());
        double d;
        try {
            d = new GaugeSolver().diameterM(x -> wound ? StringConstruction.wound(core, coreD, wrap, x)
                    : StringConstruction.plain(core, x), guess, l, r.targetHz(), r.tensionN(), r.stiffnessOn(),
                    r.endOrDefault());
        } catch (PitchUnreachableException e) {
            throw new BadRequestException("tensionN", e.getMessage());
        }
        StringConstruction c = wound ? StringConstruction.wound(core, coreD, wrap, d) : StringConstruction.plain(core, d);
        StressCheck stress = StressCheck.of(r.tensionN(), c.coreDiameterM(), core.tensileStrengthPa());
        Note note = new EqualTemperament(r.referenceA4OrDefault()).nearest(r.targetHz());
        return new GaugeJson(wound ? "wrapDiameterMm" : "diameterMm", d / MM, c.coreDiameterM() / MM,
                wound ? d / MM : null, c.outerDiameterM() / MM, c.linearDensityKgPerM(), r.tensionN(), stress.stressPa(),
                core.tensileStrengthPa(), stress.fractionOfStrength(), wording.warnings(stress), wording.caution(),
                new StringAnalysisResponse.NoteJson(note.name(), note.midi(), note.frequencyHz(), note.centsOff()));
    }

    /** The solved diameter (which one in {@code solved}) and the string it makes. */
    record GaugeJson(String solved, double diameterMm, double coreDiameterMm, Double wrapDiameterMm,
            double outerDiameterMm, double linearDensityKgPerM, double tensionN, double stressPa,
            double tensileStrengthPa, double stressFraction, List<String> warnings, String caution,
            StringAnalysisResponse.NoteJson note) {
    }
}
