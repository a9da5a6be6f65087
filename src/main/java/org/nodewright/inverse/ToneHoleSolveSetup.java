package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.nodewright.aircolumns.AirColumnMapper;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.SolverLimits;
import org.nodewright.physics.inverse.ToneHoleSolver;
import org.nodewright.web.FieldProblem;

/**
 * A validated solve request turned into the solver's inputs; its cross-field rules
 * ({@link #problems}) run with the request's validation ({@link ToneHoleSolveRequest#crossFieldProblems()}).
 */
record ToneHoleSolveSetup(AirColumnRequest bore, AirCoreFrequencyModel model, HoleLayout start,
        List<Fingering> fingerings, SolverLimits limits) {

    /** The maker's limits with their defaults taken from the bore (see {@link ToneHoleSolveRequest.Limits}). */
    record Bounds(double minPositionMm, double endMarginMm, double minWallMm, double minDiameterMm,
            double maxDiameterMm, boolean varyDiameters, boolean varyFoot, double minFootMm, double maxFootMm,
            double footMm) {

        static Bounds of(AirColumnRequest bore, ToneHoleSolveRequest.Limits l) {
            double length = BoreMapping.lengthMm(bore);
            double foot = bore.segments().get(bore.segments().size() - 1).lengthMm();
            double minBore = bore.segments().stream()
                    .mapToDouble(s -> Math.min(s.inputDiameterMm(), s.outputDiameterMm())).min().orElse(1);
            double minDia = l.minDiameterMm() == null ? Math.min(2.0, minBore) : l.minDiameterMm();
            return new Bounds(l.minPositionMm() == null ? 0.1 * length : l.minPositionMm(),
                    l.endMarginMm() == null ? 5.0 : l.endMarginMm(),
                    l.minWallMm() == null ? 2.0 : l.minWallMm(),
                    minDia, l.maxDiameterMm() == null ? minBore : l.maxDiameterMm(),
                    Boolean.TRUE.equals(l.varyDiameters()), Boolean.TRUE.equals(l.varyFoot()),
                    l.minFootMm() == null ? 0.5 * foot : l.minFootMm(),
                    l.maxFootMm() == null ? 1.5 * foot : l.maxFootMm(), foot);
        }

        SolverLimits toCore() {
            return new SolverLimits(minPositionMm, endMarginMm, minWallMm, minDiameterMm, maxDiameterMm,
                    varyDiameters, varyFoot, minFootMm, maxFootMm);
        }
    }

    /** The solve's rules across the bore and the limits; the bore's own fields are checked by its record. */
    static void problems(List<FieldProblem> out, AirColumnRequest bore, ToneHoleSolveRequest.Limits l) {
        if (BoreMapping.holes(bore).isEmpty()) {
            out.add(new FieldProblem("bore.holes", "the solver needs at least one hole to move"));
        }
        if (bore.fingerings() == null || bore.fingerings().isEmpty()) {
            out.add(new FieldProblem("bore.fingerings", "give at least one fingering with its target note"));
        }
        if (!usable(bore)) {
            return;
        }
        Bounds b = Bounds.of(bore, l);
        if (b.maxDiameterMm() < b.minDiameterMm()) {
            out.add(new FieldProblem("limits.maxDiameterMm", "must not be below minDiameterMm ("
                    + b.minDiameterMm() + ")"));
        }
        if (b.maxFootMm() < b.minFootMm()) {
            out.add(new FieldProblem("limits.maxFootMm", "must not be below minFootMm (" + b.minFootMm() + ")"));
        }
        if (b.varyFoot() && (b.footMm() < b.minFootMm() || b.footMm() > b.maxFootMm())) {
            out.add(new FieldProblem("limits.minFootMm", "the last section (" + b.footMm()
                    + " mm) must lie within minFootMm..maxFootMm"));
        }
        List<AirColumnRequest.Hole> holes = BoreMapping.holes(bore);
        for (int i = 0; i < holes.size(); i++) {
            AirColumnRequest.Hole h = holes.get(i);
            String at = "bore.holes[" + i + "]";
            if (i > 0 && h.positionMm() <= holes.get(i - 1).positionMm()) {
                out.add(new FieldProblem(at + ".positionMm", "holes must be listed from the input end"));
            }
            if (h.positionMm() < b.minPositionMm()) {
                out.add(new FieldProblem(at + ".positionMm", "lies before limits.minPositionMm ("
                        + b.minPositionMm() + ")"));
            }
            if (b.varyDiameters() && (h.diameterMm() < b.minDiameterMm() || h.diameterMm() > b.maxDiameterMm())) {
                out.add(new FieldProblem(at + ".diameterMm", "must lie within the diameter limits ("
                        + b.minDiameterMm() + ".." + b.maxDiameterMm() + " mm)"));
            }
        }
    }

    /** Every bore figure the rules read is present and finite (else the bore's own constraints speak). */
    private static boolean usable(AirColumnRequest bore) {
        if (bore.segments() == null || bore.segments().isEmpty()) {
            return false;
        }
        for (AirColumnRequest.Segment s : bore.segments()) {
            if (s == null || !finite(s.lengthMm()) || !finite(s.inputDiameterMm()) || !finite(s.outputDiameterMm())) {
                return false;
            }
        }
        for (AirColumnRequest.Hole h : BoreMapping.holes(bore)) {
            if (h == null || !finite(h.positionMm()) || !finite(h.diameterMm())) {
                return false;
            }
        }
        return true;
    }

    /** The solver's inputs for a request that passed validation. */
    static ToneHoleSolveSetup of(ToneHoleSolveRequest request) {
        AirColumnRequest bore = request.bore();
        Bounds b = Bounds.of(bore, request.limitsOrNone());
        List<Fingering> fingerings = namedFingerings(bore);
        return new ToneHoleSolveSetup(bore, BoreMapping.model(bore), BoreMapping.layout(bore), fingerings, b.toCore());
    }

    /** The bore's fingerings as the solvers take them, each unnamed one called "fingering N" (N from 1). */
    static List<Fingering> namedFingerings(AirColumnRequest bore) {
        List<Fingering> fingerings = new ArrayList<>();
        for (Fingering f : AirColumnMapper.fingerings(bore)) {
            String name = f.name() == null || f.name().isBlank() ? "fingering " + (fingerings.size() + 1) : f.name();
            fingerings.add(new Fingering(name, f.closedHoles(), f.targetHz(), f.register()));
        }
        return fingerings;
    }

    /** The job's work for {@link SolveJobs#accepted}: the tone-hole solve of a request that passed validation. */
    static Function<SolveJob, Object> work(ToneHoleSolveRequest request) {
        ToneHoleSolveSetup setup = of(request);
        double tolerance = request.toleranceOrDefault();
        int cap = request.maxEvaluationsOrDefault();
        return j -> ToneHoleResult.of(new ToneHoleSolver(tolerance, cap).solve(setup.model(), setup.start(),
                setup.model().lengthBeforeFootMm(), setup.fingerings(), setup.limits(), j, j::cancelRequested),
                tolerance, setup.bore());
    }

    /** A figure is present and finite (else its own constraints speak). */
    static boolean finite(Double v) {
        return v != null && Double.isFinite(v);
    }
}
