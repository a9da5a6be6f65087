package org.nodewright.strings;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.strings.PitchUnreachableException;
import org.nodewright.physics.strings.SetString;
import org.nodewright.physics.strings.StressCheck;
import org.nodewright.physics.strings.StringSets;
import org.nodewright.web.BadRequestException;
import org.springframework.stereotype.Service;

/** Maps a string-set request to the core and back. */
@Service
class StringSetService {

    /** Standard gravity, 9.80665 m/s² (CGPM 1901), for kilogram-force. */
    private static final double G0 = 9.80665;

    private final StressWording wording;

    StringSetService(StressWording wording) {
        this.wording = wording;
    }

    StringSetResponse analyze(StringSetRequest r) {
        List<SetString> strings = new ArrayList<>();
        for (StringSetRequest.Member m : r.strings()) {
            double lengthMm = m.lengthMm() != null ? m.lengthMm() : r.lengthMm();
            strings.add(new SetString(lengthMm * 1e-3, m.targetHz(), StringAnalysisService.construction(
                    Materials.get(m.material()), m.diameterMm(), m.wrapMaterial(), m.wrapDiameterMm())));
        }
        StringSets.Result result;
        try {
            result = StringSets.analyze(strings, r.stiffnessOn(), r.endOrDefault(), r.referenceA4OrDefault());
        } catch (PitchUnreachableException e) {
            throw new BadRequestException("strings", e.getMessage());
        }
        List<StringSetResponse.StringJson> out = new ArrayList<>();
        List<String> all = new ArrayList<>();
        for (int i = 0; i < result.members().size(); i++) {
            StringSets.Member m = result.members().get(i);
            StressCheck s = m.stress();
            String label = r.strings().get(i).label();
            List<String> warnings = wording.warnings(s);
            for (String w : warnings) {
                all.add(wording.memberWarning(i, label, w));
            }
            out.add(new StringSetResponse.StringJson(i, label, m.string().lengthM() * 1e3, m.string().targetHz(),
                    m.tensionN(), m.tensionN() / G0, m.linearDensityKgPerM(), s.stressPa(), s.tensileStrengthPa(),
                    s.fractionOfStrength(), warnings, new StringAnalysisResponse.NoteJson(m.note().name(),
                            m.note().midi(), m.note().frequencyHz(), m.note().centsOff()),
                    StressLevel.of(s.fractionOfStrength())));
        }
        return new StringSetResponse(out, result.totalTensionN(), result.totalTensionN() / G0, all,
                wording.caution(), wording.neckCaution(), StressLevel.LIMITS);
    }
}
