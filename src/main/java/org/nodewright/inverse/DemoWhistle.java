package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.SolverLimits;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.NoteNames;

/**
 * The Harrowgate Lane Workshop six-hole whistle in D (an invented instrument): a 285 mm cylinder
 * of 13 mm bore, open at the window (input) end, holes drilled at a first guess. Hole 0 is nearest
 * the window; closing all six gives D5, opening them from the bottom up climbs the D major scale
 * to C#6. Air at 20 C and 50 % relative humidity. Demo data: it lives with the demo requests
 * ({@link DemoRequests}), not in the core, and every figure is handed out as an immutable value or a
 * fresh copy.
 */
public final class DemoWhistle {

    public static final double LENGTH_MM = 285.0;
    public static final double BORE_MM = 13.0;
    public static final double CHIMNEY_MM = 2.5;
    /** Hole centres from the window, mm. */
    public static final List<Double> POSITIONS_MM = List.of(128.0, 148.0, 170.0, 196.0, 214.0, 238.0);
    /** Hole diameters, mm. */
    public static final List<Double> DIAMETERS_MM = List.of(6.5, 7.0, 7.0, 6.0, 7.5, 6.5);
    /** The scale the fingerings play, all holes closed first. */
    public static final List<String> NOTES = List.of("D5", "E5", "F#5", "G5", "A5", "B5", "C#6");
    /** The second register the same fingerings overblow to (C#7 is left out, as on most whistles' charts). */
    public static final List<String> SECOND_REGISTER = List.of("D6", "E6", "F#6", "G6", "A6", "B6");
    /** The blank the workshop cuts a whistle from: 13 mm bore, 280 mm long, a 4 x 8 mm window through 1.5 mm of wall. */
    public static final double BLANK_LENGTH_MM = 280.0;
    public static final double WINDOW_LENGTH_MM = 4.0;
    public static final double WINDOW_WIDTH_MM = 8.0;
    public static final double WINDOW_WALL_MM = 1.5;
    public static final double TEMPERATURE_C = 20.0;
    public static final double HUMIDITY_PCT = 50.0;

    private DemoWhistle() {
    }

    public static AirCoreFrequencyModel model() {
        double[] chimneys = new double[POSITIONS_MM.size()];
        java.util.Arrays.fill(chimneys, CHIMNEY_MM);
        return new AirCoreFrequencyModel(List.of(new BoreSegment(LENGTH_MM * 1e-3, BORE_MM * 0.5e-3, BORE_MM * 0.5e-3)),
                chimneys, InputEnd.OPEN, OutputEnd.OPEN_UNFLANGED, AirProperties.at(TEMPERATURE_C, HUMIDITY_PCT), true);
    }

    public static HoleLayout start() {
        return new HoleLayout(array(POSITIONS_MM), array(DIAMETERS_MM), LENGTH_MM);
    }

    /** D5 with every hole closed, then one more hole opened from the bottom (hole 5) for each step up. */
    public static List<Fingering> fingerings() {
        List<Fingering> out = new ArrayList<>();
        for (int step = 0; step < NOTES.size(); step++) {
            Set<Integer> closed = new java.util.HashSet<>();
            for (int h = 0; h < POSITIONS_MM.size() - step; h++) {
                closed.add(h);
            }
            out.add(new Fingering(NOTES.get(step), closed,
                    NoteNames.frequencyHz(NOTES.get(step), EqualTemperament.ISO_16_A4_HZ), 1));
        }
        return out;
    }

    /**
     * Both registers: the seven first-register fingerings, then the same fingerings from all
     * closed to one hole closed overblown to D6..B6 (register 2).
     */
    public static List<Fingering> twoRegisterFingerings() {
        List<Fingering> out = new ArrayList<>(fingerings());
        for (int step = 0; step < SECOND_REGISTER.size(); step++) {
            Fingering low = out.get(step);
            String note = SECOND_REGISTER.get(step);
            out.add(new Fingering(note, low.closedHoles(), NoteNames.frequencyHz(note, EqualTemperament.ISO_16_A4_HZ), 2));
        }
        return out;
    }

    /** The maker's limits for the demo: holes 40 mm clear of the window and 10 mm of the end, 3 mm wall. */
    public static SolverLimits limits(boolean varyDiameters) {
        return new SolverLimits(40.0, 10.0, 3.0, 4.0, 9.0, varyDiameters, true, 240.0, 330.0);
    }

    private static double[] array(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
