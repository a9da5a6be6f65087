package org.nodewright.physics.strings;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.Require;

/** Fret positions for N equal divisions of the octave. */
public final class Frets {

    public static final int MAX_FRETS = 200;
    public static final int MAX_DIVISIONS = 200;

    private Frets() {
    }

    /** Fret k sits where the remaining length is L·2^(−k/N): x_k = L·(1 − 2^(−k/N)) (equal temperament). */
    public static List<Fret> equalDivisions(double scaleLengthM, int count, int divisionsPerOctave) {
        Require.positive("scaleLengthM", scaleLengthM);
        Require.between("fret count", count, 1, MAX_FRETS);
        Require.between("divisions per octave", divisionsPerOctave, 1, MAX_DIVISIONS);
        List<Fret> frets = new ArrayList<>(count);
        double previous = 0;
        for (int k = 1; k <= count; k++) {
            double x = -scaleLengthM * Math.expm1(-k * Math.log(2) / divisionsPerOctave);
            frets.add(new Fret(k, x, x - previous));
            previous = x;
        }
        return List.copyOf(frets);
    }
}
