package org.nodewright.physics.aircolumn;

/** What sits at the player's end of a bore (see {@link Mouth}). */
public enum MouthKind {
    /** Transverse flute head: embouchure hole, lip coverage, headspace to the stopper. */
    EMBOUCHURE(InputEnd.OPEN),
    /** Duct (fipple) flute, whistle, recorder, flue pipe: the window and any headspace. */
    WINDOW(InputEnd.OPEN),
    /** Single or double reed: its equivalent volume at x = 0. */
    REED(InputEnd.CLOSED),
    /** Brass mouthpiece: cup volume and throat before the backbore. */
    CUP(InputEnd.CLOSED);

    private final InputEnd inputEnd;

    MouthKind(InputEnd inputEnd) {
        this.inputEnd = inputEnd;
    }

    /** The input end this kind plays at: impedance minima (open) or maxima (closed). */
    public InputEnd inputEnd() {
        return inputEnd;
    }
}
