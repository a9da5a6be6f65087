package org.nodewright.physics.aircolumn;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * A bore as the chain of elements its transfer matrices are applied along, in order from the input
 * end: {@link Duct}s (collinear segments first joined, see {@link #mergeCollinear}; lossy cones
 * cut so that radii within one duct differ by at most 15 %) with a {@link SideHole} at each hole's
 * centre, the duct there split in two.
 */
final class ElementChain {

    private static final double MAX_LOSSY_CONE_RATIO = 1.15;
    /**
     * Longest duct in a temperature gradient, m: over 5 mm the air at the midpoint gives each
     * piece's travel time to second order in the (linear) temperature change.
     */
    static final double MAX_GRADIENT_PIECE = 0.005;
    private static final int MAX_GRADIENT_PIECES = 400;

    private final ChainElement[] elements;
    private final Duct[] ducts;
    private final double length;
    private final LocalAir outputAir;
    /** Element index of each duct, in chain order, and the ducts' upstream ends (ascending). */
    private final int[] ductElement;
    private final double[] ductStart;

    private ElementChain(List<ChainElement> elements, double length, LocalAir outputAir) {
        this.elements = elements.toArray(new ChainElement[0]);
        this.ducts = elements.stream().filter(Duct.class::isInstance).map(Duct.class::cast).toArray(Duct[]::new);
        this.length = length;
        this.outputAir = outputAir;
        if (ducts.length == 0) {
            throw new IllegalStateException("no duct element");
        }
        ductElement = new int[ducts.length];
        ductStart = new double[ducts.length];
        for (int e = 0, i = 0; e < this.elements.length; e++) {
            if (this.elements[e] instanceof Duct d) {
                if (i > 0 && d.start < ductStart[i - 1]) {
                    throw new IllegalStateException("ducts out of order at element " + e);
                }
                ductElement[i] = e;
                ductStart[i++] = d.start;
            }
        }
    }

    /**
     * The chain of column (its segments, holes and whether losses cut the cones finer). With a
     * breath whose temperature changes along the bore, ducts are also cut to at most
     * {@link #MAX_GRADIENT_PIECE} metres, each in the air at its midpoint.
     */
    static ElementChain of(AirColumn column, KeefeExpansion keefe) {
        AirProperties ref = column.referenceAir();
        Breath breath = column.breath();
        double total = column.length();
        boolean gradient = breath != null && breath.hasGradient();
        LocalAir uniform = LocalAir.reference(ref, keefe);
        java.util.function.DoubleFunction<LocalAir> airAt = gradient
                ? x -> LocalAir.relative(breath.airAt(x / total), ref) : x -> uniform;
        List<ChainElement> out = new ArrayList<>();
        List<ToneHole> sorted = new ArrayList<>(column.holes());
        sorted.sort(Comparator.comparingDouble(ToneHole::position));
        boolean losses = column.losses();
        double xs = 0;
        int h = 0;
        for (BoreSegment seg : mergeCollinear(column.segments())) {
            double xe = xs + seg.length();
            double from = xs;
            while (h < sorted.size() && sorted.get(h).position() <= xe) {
                ToneHole hole = sorted.get(h);
                double at = hole.position();
                if (at > from) {
                    addDucts(out, from, at - from, seg.radiusAt(from - xs), seg.radiusAt(at - xs), losses, gradient,
                            airAt);
                    from = at;
                }
                out.add(new SideHole(at, new ToneHoleModel(hole, seg.radiusAt(at - xs)), airAt.apply(at)));
                h++;
            }
            if (xe > from) {
                addDucts(out, from, xe - from, seg.radiusAt(from - xs), seg.outputRadius(), losses, gradient, airAt);
            }
            xs = xe;
        }
        return new ElementChain(out, total, gradient ? airAt.apply(total) : uniform);
    }

    private static void addDucts(List<ChainElement> out, double from, double length, double ra, double rb,
            boolean losses, boolean gradient, java.util.function.DoubleFunction<LocalAir> airAt) {
        int n = 1;
        if (losses && ra != rb) {
            double ratio = Math.max(ra, rb) / Math.min(ra, rb);
            n = (int) Math.ceil(Math.log(ratio) / Math.log(MAX_LOSSY_CONE_RATIO) - 1e-9);
            n = Math.max(1, Math.min(n, 64));
        }
        if (gradient) {
            n = Math.max(n, Math.min(MAX_GRADIENT_PIECES, (int) Math.ceil(length / MAX_GRADIENT_PIECE - 1e-9)));
        }
        for (int i = 0; i < n; i++) {
            double a = ra + (rb - ra) * i / n;
            double b = ra + (rb - ra) * (i + 1) / n;
            double x0 = from + length * i / n;
            out.add(new Duct(x0, length / n, a, b, airAt.apply(x0 + length / (2 * n))));
        }
    }

    /**
     * Joins consecutive segments that form one straight cone or cylinder (same taper, no step):
     * the exact cone matrix of the whole run equals the product of its parts without losses, and
     * with losses the run is cut again (radii within an element differ by at most 15 %), so a bore
     * drawn as many collinear frusta costs no more than its distinct tapers.
     */
    static List<BoreSegment> mergeCollinear(List<BoreSegment> segments) {
        List<BoreSegment> out = new ArrayList<>();
        BoreSegment run = null;
        for (BoreSegment s : segments) {
            if (run != null && collinear(run, s)) {
                run = new BoreSegment(run.length() + s.length(), run.inputRadius(), s.outputRadius());
            } else {
                if (run != null) {
                    out.add(run);
                }
                run = s;
            }
        }
        out.add(run);
        return out;
    }

    private static boolean collinear(BoreSegment a, BoreSegment b) {
        double scale = Math.max(a.outputRadius(), b.inputRadius());
        if (Math.abs(a.outputRadius() - b.inputRadius()) > 1e-9 * scale) {
            return false;
        }
        if (a.isCylinder() && b.isCylinder()) {
            return true;
        }
        double ta = (a.outputRadius() - a.inputRadius()) / a.length();
        double tb = (b.outputRadius() - b.inputRadius()) / b.length();
        return Math.abs(ta - tb) <= 1e-9 * Math.max(Math.abs(ta), Math.abs(tb)) && ta != 0 && tb != 0;
    }

    /** Number of elements (ducts and holes). */
    int size() {
        return elements.length;
    }

    /** Element e, counted from the input end. */
    ChainElement get(int e) {
        return elements[e];
    }

    /** The elements from the input end (a copy). */
    ChainElement[] toArray() {
        return elements.clone();
    }

    /** The air at the output end, relative to the reference air. */
    LocalAir outputAir() {
        return outputAir;
    }

    /** Total axial length, m. */
    double length() {
        return length;
    }

    /**
     * Index of the duct containing x: the last duct starting at or before x (the first duct for x
     * before it).
     */
    int ductIndexAt(double x) {
        // Binary search (the profiles ask once per sample point): the last start <= x.
        int lo = 0;
        int hi = ductStart.length - 1;
        if (!(ductStart[0] <= x)) {
            return ductElement[0];
        }
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (ductStart[mid] <= x) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return ductElement[lo];
    }

    /** Upstream ends of the ducts and the bore's end, m (for sampling profiles). */
    double[] boundaries() {
        double[] xs = new double[ducts.length + 1];
        for (int i = 0; i < ducts.length; i++) {
            xs[i] = ducts[i].start;
        }
        xs[ducts.length] = length;
        return xs;
    }
}
