package org.nodewright.bars;

import java.util.List;
import org.nodewright.physics.bars.BarEnds;
import org.nodewright.physics.bars.BeamTheory;
import org.nodewright.physics.bars.ModeFamily;
import org.nodewright.web.ChartPrecision;
import tools.jackson.databind.annotation.JsonSerialize;

/**
 * Answer of {@code POST /api/v1/bars/analyze}: the contract's fields plus extras for the page
 * (the Poisson's ratio the shear coefficient was taken at, the material used, cord holes, cautions).
 *
 * @param modes the bending modes through the thickness ascending, then the other families
 *              (twisting, lateral bending) ascending in frequency
 */
public record BarAnalysisResponse(
        double shearCoefficient,
        double poissonRatio,
        BeamTheory theory,
        BarEnds ends,
        double referenceA4Hz,
        MaterialUsed material,
        List<Double> cordHolesMm,
        List<String> cautions,
        List<ModeJson> modes) {

    /** The figures the analysis used (a catalogue material's, or the request's own). */
    public record MaterialUsed(String id, double densityKgPerM3, double youngsModulusPa, double shearModulusPa) {
    }

    /** The nearest 12-TET note. */
    public record NoteJson(String name, int midi, double frequencyHz, double centsOff) {
    }

    /**
     * One mode: positions in mm from x = 0, ascending; {@code shape} the transverse displacement
     * (the twist for a twisting mode) at {@code shapeX}, largest |sample| = 1.
     */
    public record ModeJson(
            int n,
            ModeFamily kind,
            double frequencyHz,
            double ratioToFirst,
            NoteJson note,
            List<Double> nodesMm,
            List<Double> antinodesMm,
            @JsonSerialize(using = ChartPrecision.class) double[] shapeX,
            @JsonSerialize(using = ChartPrecision.class) double[] shape) {
    }
}
