package org.nodewright.strings;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.EndCondition;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.strings.Mode;
import org.nodewright.physics.strings.ModeShape;
import org.nodewright.physics.strings.Pickup;
import org.nodewright.physics.strings.PitchUnreachableException;
import org.nodewright.physics.strings.StressCheck;
import org.nodewright.physics.strings.StringAnalysis;
import org.nodewright.physics.strings.StringAnalyzer;
import org.nodewright.physics.strings.StringConstruction;
import org.nodewright.physics.strings.StringDesign;
import org.nodewright.physics.tuning.Note;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.EnumWords;
import org.springframework.stereotype.Service;

/** Maps a validated request (mm) to the core (SI) and the result back (mm). */
@Service
class StringAnalysisService {

    private final StressWording wording;

    StringAnalysisService(StressWording wording) {
        this.wording = wording;
    }

    StringAnalysisResponse analyze(StringAnalysisRequest r) {
        return analyze(r, true);
    }

    /** The analysis; without {@code withShapes} the modes' shapeX and shape are null (lighter answer). */
    StringAnalysisResponse analyze(StringAnalysisRequest r, boolean withShapes) {
        StringDesign design = toDesign(r);
        StringAnalysis a;
        try {
            a = new StringAnalyzer().analyze(design);
        } catch (PitchUnreachableException e) {
            throw new BadRequestException("targetHz", e.getMessage());
        } catch (IllegalStateException | org.hipparchus.exception.MathRuntimeException e) {
            // A numerical failure on an extreme but valid design: still the client's 400, never a 500.
            throw new BadRequestException("endCondition",
                    "the modes could not be computed for this combination of values: " + e.getMessage());
        }
        return toResponse(r, a, withShapes);
    }

    static StringDesign toDesign(StringAnalysisRequest r) {
        double lengthM = r.lengthMm() * MM;
        Material core = r.material() == null ? null : Materials.get(r.material());
        double mu;
        if (r.linearDensityKgPerM() != null) {
            mu = r.linearDensityKgPerM();
        } else {
            mu = construction(core, r.diameterMm(), r.wrapMaterial(), r.wrapDiameterMm()).linearDensityKgPerM();
        }
        double ei = 0;
        if (r.stiffnessOn()) {
            double e = r.youngsModulusPa() != null ? r.youngsModulusPa() : core.youngsModulusPa();
            ei = e * StringConstruction.secondMomentOfArea(r.diameterMm() * MM);
        }
        Double coreDiameterM = r.diameterMm() == null ? null : r.diameterMm() * MM;
        Double strength = core == null ? null : core.tensileStrengthPa();
        List<Pickup> pickups = new ArrayList<>();
        if (r.pickups() != null) {
            r.pickups().forEach(p -> pickups.add(new Pickup(p.positionMm() * MM, p.apertureOrZero() * MM)));
        }
        return new StringDesign(lengthM, r.tensionN(), r.targetHz(), mu, ei, r.endOrDefault(),
                coreDiameterM, strength, r.modeCountOrDefault(),
                r.pluck() == null ? null : r.pluck().kindOrDefault(),
                r.pluck() == null ? 0 : r.pluck().positionMm() * MM, pickups,
                r.pickupCombination() == null ? null : r.pickupCombination(), r.referenceA4OrDefault());
    }

    static StringConstruction construction(Material core, double diameterMm, String wrapMaterial, Double wrapDiameterMm) {
        if (wrapMaterial == null) {
            return StringConstruction.plain(core, diameterMm * MM);
        }
        return StringConstruction.wound(core, diameterMm * MM, Materials.get(wrapMaterial), wrapDiameterMm * MM);
    }

    private StringAnalysisResponse toResponse(StringAnalysisRequest r, StringAnalysis a, boolean withShapes) {
        double lengthMm = r.lengthMm();
        List<StringAnalysisResponse.ModeJson> modes = new ArrayList<>();
        for (StringAnalysis.ModeResponse m : a.modes()) {
            modes.add(mode(m, lengthMm, r, withShapes));
        }
        StressCheck stress = a.stress();
        Double strength = stress == null || Double.isNaN(stress.tensileStrengthPa()) ? null : stress.tensileStrengthPa();
        Note note = a.note();
        boolean clampedShapes = r.stiffnessOn() && r.endOrDefault() == EndCondition.CLAMPED;
        return new StringAnalysisResponse(a.model().tensionN(), a.model().linearDensityKgPerM(),
                a.model().waveSpeedMps(), a.fundamentalHz(), a.model().idealFundamentalHz(), a.model().inharmonicityB(),
                stress == null ? null : stress.stressPa(), strength,
                strength == null ? null : stress.fractionOfStrength(),
                wording.warnings(stress), wording.caution(),
                new StringAnalysisResponse.NoteJson(note.name(), note.midi(), note.frequencyHz(), note.centsOff()),
                r.referenceA4OrDefault(), EnumWords.word(r.endOrDefault()), r.stiffnessOn(),
                clampedShapes ? "clamped-beam-under-tension" : "sine",
                r.pickupCombination() == null ? null : EnumWords.word(r.pickupCombination()),
                modes, StressLevel.of(strength == null ? null : stress.fractionOfStrength()));
    }

    private static StringAnalysisResponse.ModeJson mode(StringAnalysis.ModeResponse m, double lengthMm,
            StringAnalysisRequest r, boolean withShapes) {
        Mode mode = m.mode();
        ModeShape shape = mode.shape();
        double[] nodes = shape.nodes();
        double[] antinodes = shape.antinodes();
        double[] shapeX = null;
        double[] shapeValues = null;
        if (withShapes) {
            int samples = r.shapeSamplesFor(mode.n());
            shapeX = new double[samples];
            shapeValues = new double[samples];
            for (int i = 0; i < samples; i++) {
                double xi = (double) i / (samples - 1);
                shapeX[i] = lengthMm * xi;
                shapeValues[i] = shape.value(xi);
            }
        }
        List<Double> outputs = null;
        Double combinedOutput = null;
        if (m.excitation() != null) {
            outputs = m.pickupGains().stream().map(g -> g * m.excitation()).toList();
            combinedOutput = m.combined() == null ? null : m.combined() * m.excitation();
        }
        return new StringAnalysisResponse.ModeJson(mode.n(), mode.frequencyHz(), mode.harmonicHz(),
                mode.centsFromHarmonic(), scaled(nodes, lengthMm, false), scaled(antinodes, lengthMm, false),
                scaled(nodes, lengthMm, true), scaled(antinodes, lengthMm, true), m.excitation(), m.pickupGains(),
                outputs, m.combined(), combinedOutput, shapeX, shapeValues);
    }

    /** ξ → mm from the nut, or from the bridge (then in ascending order from the bridge). */
    private static List<Double> scaled(double[] xi, double lengthMm, boolean fromBridge) {
        List<Double> out = new ArrayList<>(xi.length);
        if (fromBridge) {
            for (int i = xi.length - 1; i >= 0; i--) {
                out.add((1 - xi[i]) * lengthMm);
            }
        } else {
            for (double v : xi) {
                out.add(v * lengthMm);
            }
        }
        return out;
    }
}
