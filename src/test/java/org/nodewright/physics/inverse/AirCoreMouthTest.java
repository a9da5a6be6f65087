package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.aircolumn.AirColumnAnalyzer;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.Mouth;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.tuning.Cents;

/** The solver's frequency model takes the mouth along: it sounds what the bench predicts. */
class AirCoreMouthTest {

    @Test
    void theSolversModelHearsTheWindow() {
        AirProperties air = AirProperties.at(20, 50);
        List<BoreSegment> bore = List.of(new BoreSegment(0.260, 0.0065, 0.0065));
        Mouth window = new Mouth.Window(0.004, 0.008, 0.0015, 0);
        AirCoreFrequencyModel bare = new AirCoreFrequencyModel(bore, new double[] {2.5}, InputEnd.OPEN,
                OutputEnd.OPEN_UNFLANGED, air, true);
        AirCoreFrequencyModel withWindow = new AirCoreFrequencyModel(bore, new double[] {2.5}, InputEnd.OPEN,
                OutputEnd.OPEN_UNFLANGED, air, true, window, null);
        HoleLayout layout = new HoleLayout(new double[] {200.0}, new double[] {6.0}, 260.0);
        Fingering closed = new Fingering("closed", Set.of(0), 600, 1);
        double fBare = bare.soundingHz(layout, closed, 650);
        double fWindow = withWindow.soundingHz(layout, closed, 600);
        // The window lowers the note by well over a semitone here (about 25 mm of extra length).
        assertThat(Cents.between(fWindow, fBare)).isLessThan(-100);
        // And the model agrees with the bench's analysis of the same column (0.01 cent).
        double bench = new AirColumnAnalyzer(440, 21).analyze(withWindow.column(layout, closed), 300, 3000, 500,
                List.of()).resonances().get(0).resonance().frequencyHz();
        assertThat(Cents.between(fWindow, bench)).isCloseTo(0, offset(0.01));
    }
}
