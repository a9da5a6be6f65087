package org.nodewright.physics.inverse;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.aircolumn.Mouth;

/**
 * The player's end's figures a hole solve may move with the holes: the headspace (closed bore
 * upstream of a window or embouchure hole) and a window's length along the bore. The headspace's
 * compliance in parallel with the mouth's inertance makes the mouth's end correction grow with
 * frequency (Nederveen 1969; Fletcher &amp; Rossing 1998 ch. 16, from memory), which narrows
 * the octaves (common practice: a flute maker tunes the octaves with the stopper's place); a
 * window's length sets its inertance, the end correction of every note.
 */
public final class MouthFreedom {

    public static final String HEADSPACE = "headspaceMm";
    public static final String WINDOW_LENGTH = "windowLengthMm";

    private MouthFreedom() {
    }

    /** A closed range of millimetres; {@code null} where the figure stays as it is. */
    public record Range(double minMm, double maxMm) {
    }

    /**
     * @param base      the model with the mouth as the maker gave it (a window or an embouchure)
     * @param headspace headspace bounds, or null to keep it
     * @param window    window-length bounds (a window only), or null to keep it
     * @throws IllegalArgumentException when the model's mouth has no such figure
     */
    public static ModelFreedom of(AirCoreFrequencyModel base, Range headspace, Range window) {
        Mouth m = base.mouth();
        if (headspace == null && window == null) {
            return ModelFreedom.NONE;
        }
        if (!(m instanceof Mouth.Window) && !(m instanceof Mouth.Embouchure)) {
            throw new IllegalArgumentException("only a window or an embouchure has a headspace or window to move");
        }
        if (window != null && !(m instanceof Mouth.Window)) {
            throw new IllegalArgumentException("only a window has a window length to move");
        }
        List<ModelFreedom.Variable> vars = new ArrayList<>();
        double head = (m instanceof Mouth.Window w ? w.headspace() : ((Mouth.Embouchure) m).headspace()) / MM;
        if (headspace != null) {
            vars.add(new ModelFreedom.Variable(HEADSPACE, clamp(head, headspace), headspace.minMm(), headspace.maxMm()));
        }
        if (window != null) {
            vars.add(new ModelFreedom.Variable(WINDOW_LENGTH, clamp(((Mouth.Window) m).length() / MM, window),
                    window.minMm(), window.maxMm()));
        }
        boolean moveHead = headspace != null;
        boolean moveWindow = window != null;
        return new ModelFreedom(vars, x -> {
            double h = moveHead ? x[0] * MM : head * MM;
            if (m instanceof Mouth.Window w) {
                double length = moveWindow ? x[moveHead ? 1 : 0] * MM : w.length();
                return base.withMouth(new Mouth.Window(length, w.width(), w.wall(), h));
            }
            Mouth.Embouchure e = (Mouth.Embouchure) m;
            return base.withMouth(new Mouth.Embouchure(e.holeLength(), e.holeWidth(), e.wall(), h, e.lipCoverage()));
        });
    }

    private static double clamp(double v, Range r) {
        return Math.min(r.maxMm(), Math.max(r.minMm(), v));
    }
}
