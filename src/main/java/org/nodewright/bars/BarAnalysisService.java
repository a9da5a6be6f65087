package org.nodewright.bars;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.bars.Bar;
import org.nodewright.physics.bars.BarAnalysis;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.bars.BarMaterials;
import org.nodewright.physics.bars.BarMode;
import org.nodewright.physics.bars.ModeFamily;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.Note;
import org.nodewright.web.BadRequestException;
import org.springframework.stereotype.Service;

/** Analyses a validated bar request and answers in mm (used by the JSON, CSV and solver endpoints alike). */
@Service
public class BarAnalysisService {

    /** Caution codes; the page words them from messages/bars.properties. */
    static final String CAUTION_WOOD_DUST = "wood-dust";
    static final String CAUTION_MEASURE_BLANK = "measure-blank";

    public BarAnalysisResponse analyze(BarAnalysisRequest r) {
        Bar bar = BarMapper.toBar(r);
        BarAnalysis a = BadRequestException.whenComputing("lengthMm",
                "the modes could not be computed for this combination of values",
                () -> BarAnalyzer.analyze(bar, r.theoryOrDefault(), r.modeCountOrDefault(), r.otherFamiliesOn()));
        return toResponse(r, bar, a);
    }

    static BarAnalysisResponse toResponse(BarAnalysisRequest r, Bar bar, BarAnalysis a) {
        EqualTemperament et = new EqualTemperament(r.referenceA4OrDefault());
        double f1 = a.fundamentalHz();
        List<BarAnalysisResponse.ModeJson> modes = new ArrayList<>();
        for (BarMode m : a.bending()) {
            modes.add(mode(m, f1, et));
        }
        for (BarMode m : a.others()) {
            modes.add(mode(m, f1, et));
        }
        List<String> cautions = new ArrayList<>();
        boolean catalogueWood = r.material() != null && BarMaterials.byId(r.material()).map(x -> x.isWood()).orElse(false);
        if (catalogueWood) {
            cautions.add(CAUTION_WOOD_DUST);
            cautions.add(CAUTION_MEASURE_BLANK);
        }
        return new BarAnalysisResponse(a.shearCoefficient(), a.poissonRatio(), r.theoryOrDefault(), r.endsOrDefault(),
                r.referenceA4OrDefault(),
                new BarAnalysisResponse.MaterialUsed(r.material(), bar.density(), bar.youngsModulus(), bar.shearModulus()),
                cordHoles(a), cautions, modes);
    }

    /** Cord holes at the nodes of the first bending mode (free bars only: a held bar has no cords). */
    static List<Double> cordHoles(BarAnalysis a) {
        BarMode first = a.bending().get(0);
        return first.nodes().stream().map(x -> x / MM).toList();
    }

    static BarAnalysisResponse.ModeJson mode(BarMode m, double f1, EqualTemperament et) {
        Note note = et.nearest(m.frequencyHz());
        double[] xs = m.shapeX().clone();
        for (int i = 0; i < xs.length; i++) {
            xs[i] /= MM;
        }
        ModeFamily kind = m.family();
        return new BarAnalysisResponse.ModeJson(m.n(), kind, m.frequencyHz(), m.frequencyHz() / f1,
                new BarAnalysisResponse.NoteJson(note.name(), note.midi(), note.frequencyHz(), note.centsOff()),
                mm(m.nodes()), mm(m.antinodes()), xs, m.shape());
    }

    private static List<Double> mm(List<Double> metres) {
        return metres.stream().map(x -> x / MM).toList();
    }
}
