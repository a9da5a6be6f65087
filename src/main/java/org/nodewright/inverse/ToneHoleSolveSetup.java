package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.SolverLimits;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.NoteNames;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;

/** Checks a solve request's cross-field rules and turns it into the solver's inputs. */
record ToneHoleSolveSetup(AirColumnRequest bore, AirCoreFrequencyModel model, HoleLayout start,
        List<Fingering> fingerings, SolverLimits limits) {

    static ToneHoleSolveSetup of(ToneHoleSolveRequest request) {
        AirColumnRequest bore = request.bore();
        ToneHoleSolveRequest.Limits l = request.limitsOrNone();
        List<FieldProblem> problems = new ArrayList<>();
        List<AirColumnRequest.Hole> holes = BoreMapping.holes(bore);
        if (holes.isEmpty()) {
            problems.add(new FieldProblem("bore.holes", "the solver needs at least one hole to move"));
        }
        if (bore.fingerings() == null || bore.fingerings().isEmpty()) {
            problems.add(new FieldProblem("bore.fingerings", "give at least one fingering with its target note"));
        }
        double length = BoreMapping.lengthMm(bore);
        double foot = bore.segments().get(bore.segments().size() - 1).lengthMm();
        boolean varyDiameters = Boolean.TRUE.equals(l.varyDiameters());
        boolean varyFoot = Boolean.TRUE.equals(l.varyFoot());
        double minPos = l.minPositionMm() == null ? 0.1 * length : l.minPositionMm();
        double margin = l.endMarginMm() == null ? 5.0 : l.endMarginMm();
        double wall = l.minWallMm() == null ? 2.0 : l.minWallMm();
        double minBore = bore.segments().stream()
                .mapToDouble(s -> Math.min(s.inputDiameterMm(), s.outputDiameterMm())).min().orElse(1);
        double minDia = l.minDiameterMm() == null ? Math.min(2.0, minBore) : l.minDiameterMm();
        double maxDia = l.maxDiameterMm() == null ? minBore : l.maxDiameterMm();
        double minFoot = l.minFootMm() == null ? 0.5 * foot : l.minFootMm();
        double maxFoot = l.maxFootMm() == null ? 1.5 * foot : l.maxFootMm();
        if (maxDia < minDia) {
            problems.add(new FieldProblem("limits.maxDiameterMm", "must not be below minDiameterMm (" + minDia + ")"));
        }
        if (maxFoot < minFoot) {
            problems.add(new FieldProblem("limits.maxFootMm", "must not be below minFootMm (" + minFoot + ")"));
        }
        if (varyFoot && (foot < minFoot || foot > maxFoot)) {
            problems.add(new FieldProblem("limits.minFootMm", "the last section (" + foot
                    + " mm) must lie within minFootMm..maxFootMm"));
        }
        for (int i = 0; i < holes.size(); i++) {
            AirColumnRequest.Hole h = holes.get(i);
            String at = "bore.holes[" + i + "]";
            if (i > 0 && h.positionMm() <= holes.get(i - 1).positionMm()) {
                problems.add(new FieldProblem(at + ".positionMm", "holes must be listed from the input end"));
            }
            if (h.positionMm() < minPos) {
                problems.add(new FieldProblem(at + ".positionMm", "lies before limits.minPositionMm (" + minPos + ")"));
            }
            if (varyDiameters && (h.diameterMm() < minDia || h.diameterMm() > maxDia)) {
                problems.add(new FieldProblem(at + ".diameterMm", "must lie within the diameter limits (" + minDia
                        + ".." + maxDia + " mm)"));
            }
        }
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
        double a4 = bore.referenceA4Hz() == null ? EqualTemperament.ISO_16_A4_HZ : bore.referenceA4Hz();
        List<Fingering> fingerings = new ArrayList<>();
        for (int i = 0; i < bore.fingerings().size(); i++) {
            AirColumnRequest.FingeringSpec f = bore.fingerings().get(i);
            double hz = f.targetHz() != null ? f.targetHz() : NoteNames.frequencyHz(f.targetNote(), a4);
            String name = f.name() == null || f.name().isBlank() ? "fingering " + (i + 1) : f.name();
            fingerings.add(new Fingering(name, new HashSet<>(f.closedHoles()), hz, f.register() == null ? 1 : f.register()));
        }
        SolverLimits limits = new SolverLimits(minPos, margin, wall, minDia, maxDia, varyDiameters, varyFoot, minFoot,
                maxFoot);
        return new ToneHoleSolveSetup(bore, BoreMapping.model(bore), BoreMapping.layout(bore), fingerings, limits);
    }
}
