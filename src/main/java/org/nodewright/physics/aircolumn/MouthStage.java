package org.nodewright.physics.aircolumn;

/**
 * The player's end as the last links of the chain: the state (P, U) at x = 0 of the bore is
 * carried to the point where the player excites the air, so that the input impedance is the one
 * the lip, jet or reed sees. Impedances divided by the reference rho c (the air at x = 0), as in
 * {@link DuctKernel}.
 *
 * <ul>
 *   <li><b>embouchure</b> (transverse flute; Nederveen, Acoustical Aspects of Woodwind Instruments,
 *       1969/1998, and Fletcher &amp; Rossing, The Physics of Musical Instruments, 1998, ch. 16):
 *       the headspace, a closed tube of the bore's input radius up to the stopper, in parallel
 *       with the bore at the hole's centre; then, in series, the hole's inner length correction
 *       t_i and a chimney of the wall height plus the matching length t_m (Lefebvre &amp; Scavone
 *       2012, the tone-hole fits, at delta = hole radius / bore radius), and the outer end: the
 *       flanged radiation impedance (Norris &amp; Sheng 1989; the lip plate is the flange) of the
 *       open area left by the lip, at the radius of that area. The round or oval hole is taken
 *       as the circle of equal area.</li>
 *   <li><b>window</b> (duct flutes, whistles, flue pipes): the same topology with the window as
 *       an orifice through the wall (the mouth inertance of Fletcher &amp; Rossing 1998 ch. 17;
 *       Ingerslev &amp; Frobenius 1947 measured such mouth corrections on flue pipes): the
 *       rectangle as the circle of equal area (for aspect ratios up to about 3 the rectangle's end
 *       correction is within a few per cent of that circle's, from memory), inner correction t_i
 *       and matching length as for a tone hole, flanged radiation outside, plus any headspace.</li>
 *   <li><b>reed</b>: the equivalent volume V as a compliance in parallel at x = 0, admittance
 *       j omega V / (rho c^2) (Nederveen 1969 §; Fletcher &amp; Rossing 1998 §15.3): at low
 *       frequency the same as a closed tube of length V / S added at the input.</li>
 *   <li><b>cup</b> (brass; Benade, Fundamentals of Musical Acoustics, 1976, ch. 20; Fletcher &amp;
 *       Rossing 1998 §14.5): the throat as a short tube (with wall losses) between two step
 *       corrections, 0.82 a (1 - 1.35 beta + 0.31 beta^3) with beta the ratio of the smaller to the
 *       larger radius (Kergomard &amp; Garcia, J. Sound Vib. 114, 465 (1987), from memory; the cup
 *       taken as a hemisphere of its volume for that ratio), then the cup volume as a compliance
 *       in parallel at the rim.</li>
 * </ul>
 */
final class MouthStage {

    /** Flanged low-frequency end correction over the radius (Norris &amp; Sheng 1989). */
    static final double FLANGED_END = 0.8216;

    private final Mouth mouth;
    /** Closed headspace duct, or null. */
    private final Duct headspace;
    /** Inner inertance length and its area (embouchure, window). */
    private final double innerLength;
    private final double openingArea;
    /** Chimney duct (embouchure, window) or throat (cup), or null. */
    private final Duct chimney;
    /** Radius and area of the radiating outer opening (embouchure, window). */
    private final double outerRadius;
    private final double outerArea;
    /** Reed or cup volume, m^3 (0 when none). */
    private final double volume;
    /** Cup: step corrections on the backbore and cup sides of the throat, m, on the throat area. */
    private final double backboreStep;
    private final double cupStep;
    private final double throatArea;

    MouthStage(Mouth mouth, double boreRadius, LocalAir air) {
        this.mouth = mouth;
        Duct head = null;
        double inner = 0;
        double opening = 0;
        Duct pipe = null;
        double outerR = 0;
        double outerS = 0;
        double v = 0;
        double bStep = 0;
        double cStep = 0;
        double sT = 0;
        if (mouth instanceof Mouth.Embouchure e) {
                head = closedTube(e.headspace(), boreRadius, air);
                double b = Math.sqrt(e.holeArea() / Math.PI);
                double delta = Math.min(1, b / boreRadius);
                inner = ToneHoleModel.innerLength(b, delta);
                opening = e.holeArea();
                double te = e.wall() + ToneHoleModel.matchingLength(b, delta);
                pipe = te > 0 ? new Duct(0, te, b, b, air) : null;
                outerS = e.openArea();
                outerR = Math.sqrt(outerS / Math.PI);
        } else if (mouth instanceof Mouth.Window w) {
                head = closedTube(w.headspace(), boreRadius, air);
                double b = Math.sqrt(w.area() / Math.PI);
                double delta = Math.min(1, b / boreRadius);
                inner = ToneHoleModel.innerLength(b, delta);
                opening = w.area();
                double te = w.wall() + ToneHoleModel.matchingLength(b, delta);
                pipe = te > 0 ? new Duct(0, te, b, b, air) : null;
                outerS = w.area();
                outerR = b;
        } else if (mouth instanceof Mouth.Reed r) {
            v = r.equivalentVolume();
        } else if (mouth instanceof Mouth.Cup c) {
                double a = c.throatRadius();
                sT = Math.PI * a * a;
                pipe = new Duct(0, c.throatLength(), a, a, air);
                bStep = stepCorrection(a, boreRadius);
                cStep = stepCorrection(a, cupRadius(c.cupVolume()));
                v = c.cupVolume();
        }
        this.headspace = head;
        this.innerLength = inner;
        this.openingArea = opening;
        this.chimney = pipe;
        this.outerRadius = outerR;
        this.outerArea = outerS;
        this.volume = v;
        this.backboreStep = bStep;
        this.cupStep = cStep;
        this.throatArea = sT;
    }

    private static Duct closedTube(double length, double radius, LocalAir air) {
        return length > 0 ? new Duct(0, length, radius, radius, air) : null;
    }

    /**
     * End correction of a step between radii a and b (Kergomard &amp; Garcia 1987, from memory):
     * 0.82 r (1 - 1.35 beta + 0.31 beta^3), r the smaller radius, beta = r / the larger; m.
     */
    static double stepCorrection(double a, double b) {
        double r = Math.min(a, b);
        double beta = r / Math.max(a, b);
        return 0.82 * r * (1 - 1.35 * beta + 0.31 * beta * beta * beta);
    }

    /** Radius of the hemisphere of volume v, m (the cup's mouth-side radius for the step correction). */
    static double cupRadius(double v) {
        return Math.cbrt(3 * v / (2 * Math.PI));
    }

    Mouth mouth() {
        return mouth;
    }

    /**
     * The cup and throat as a Helmholtz resonator, Hz: f = c / (2 pi) sqrt(S / (V l')), l' the
     * throat length plus both step corrections (Fletcher &amp; Rossing 1998 eq. (1.7) with the
     * corrections above); NaN for other mouths.
     */
    double helmholtzHz(double speedOfSound) {
        if (!(mouth instanceof Mouth.Cup c)) {
            return Double.NaN;
        }
        double l = c.throatLength() + backboreStep + cupStep;
        return speedOfSound / (2 * Math.PI) * Math.sqrt(throatArea / (c.cupVolume() * l));
    }

    /** Carries the state s at x = 0 of the bore to the player's side of the mouth. */
    void apply(DuctKernel.Frequency w, DuctKernel.State s) {
        double k = w.k;
        if (headspace != null) {
            // The closed headspace in parallel: U += (Uh / Ph) P.
            DuctKernel.State h = new DuctKernel.State();
            h.set(1, 0, 0, 0);
            double th = k * headspace.rotationLength();
            headspace.propagate(w, Math.cos(th), -Math.sin(th), h);
            double d = h.pr * h.pr + h.pi * h.pi;
            double yr = (h.ur * h.pr + h.ui * h.pi) / d;
            double yi = (h.ui * h.pr - h.ur * h.pi) / d;
            s.ur += yr * s.pr - yi * s.pi;
            s.ui += yr * s.pi + yi * s.pr;
        }
        if (mouth instanceof Mouth.Reed) {
            shuntVolume(k, s);
        } else if (mouth instanceof Mouth.Cup) {
            series(0, k * backboreStep / throatArea, s);
            pipe(w, s);
            series(0, k * cupStep / throatArea, s);
            shuntVolume(k, s);
        } else {
            series(0, k * innerLength / openingArea, s);
            pipe(w, s);
            double[] zr = new double[2];
            Radiation.normalisedImpedance(true, k * outerRadius, zr);
            series(zr[0] / outerArea, zr[1] / outerArea, s);
        }
    }

    private void pipe(DuctKernel.Frequency w, DuctKernel.State s) {
        if (chimney != null) {
            double th = w.k * chimney.rotationLength();
            chimney.propagate(w, Math.cos(th), -Math.sin(th), s);
        }
    }

    /** A series impedance zr + j zi: P += Z U. */
    private static void series(double zr, double zi, DuctKernel.State s) {
        double pr = s.pr + zr * s.ur - zi * s.ui;
        double pi = s.pi + zr * s.ui + zi * s.ur;
        s.pr = pr;
        s.pi = pi;
    }

    /** The volume's compliance in parallel: U += j k V P. */
    private void shuntVolume(double k, DuctKernel.State s) {
        double y = k * volume;
        double ur = s.ur - y * s.pi;
        double ui = s.ui + y * s.pr;
        s.ur = ur;
        s.ui = ui;
    }
}
