package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.MouthKind;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.inverse.SolverLimits;
import org.nodewright.physics.tuning.EqualTemperament;

/** The workshop's demo whistle as the API's own request shape. */
final class DemoRequests {

    private DemoRequests() {
    }

    static ToneHoleSolveRequest whistle() {
        List<AirColumnRequest.Hole> holes = new ArrayList<>();
        for (int i = 0; i < DemoWhistle.POSITIONS_MM.size(); i++) {
            holes.add(new AirColumnRequest.Hole(DemoWhistle.POSITIONS_MM.get(i), DemoWhistle.DIAMETERS_MM.get(i),
                    DemoWhistle.CHIMNEY_MM, true));
        }
        List<AirColumnRequest.FingeringSpec> fingerings = new ArrayList<>();
        for (Fingering f : DemoWhistle.fingerings()) {
            fingerings.add(new AirColumnRequest.FingeringSpec(f.name(), f.closedHoles().stream().sorted().toList(),
                    f.name(), null, 1));
        }
        AirColumnRequest bore = new AirColumnRequest(
                List.of(new AirColumnRequest.Segment(DemoWhistle.LENGTH_MM, DemoWhistle.BORE_MM, DemoWhistle.BORE_MM)),
                InputEnd.OPEN, OutputEnd.OPEN_UNFLANGED, holes, DemoWhistle.TEMPERATURE_C,
                DemoWhistle.HUMIDITY_PCT, true, 300.0, 3000.0, 3000, EqualTemperament.ISO_16_A4_HZ, null, fingerings);
        SolverLimits l = DemoWhistle.limits(false);
        return new ToneHoleSolveRequest(bore, limits(l), null, null);
    }

    private static ToneHoleSolveRequest.Limits limits(SolverLimits l) {
        return new ToneHoleSolveRequest.Limits(l.minPositionMm(), l.maxPositionMargin(),
                l.minSpacingMm(), l.minDiameterMm(), l.maxDiameterMm(), l.varyDiameters(), l.varyFoot(), l.minFootMm(),
                l.maxFootMm());
    }

    /**
     * The blank for the workshop whistle: 13 mm x 280 mm with its window, six holes through a 2.5 mm
     * wall, the D-major chart over two registers; holes 40 mm clear of the window and 10 mm of the
     * end, 3 to 11 mm across with 3 mm of wall between them, the tube cut no shorter than 200 mm.
     */
    static BlankTubeRequest blankWhistle() {
        List<AirColumnRequest.FingeringSpec> fingerings = new ArrayList<>();
        for (Fingering f : DemoWhistle.twoRegisterFingerings()) {
            fingerings.add(new AirColumnRequest.FingeringSpec(f.name(), f.closedHoles().stream().sorted().toList(),
                    f.name(), null, f.register()));
        }
        AirColumnRequest.MouthSpec window = new AirColumnRequest.MouthSpec(MouthKind.WINDOW, null, null, null,
                DemoWhistle.WINDOW_WALL_MM, 0.0, null, DemoWhistle.WINDOW_LENGTH_MM, DemoWhistle.WINDOW_WIDTH_MM, null,
                null, null, null);
        AirColumnRequest bore = new AirColumnRequest(
                List.of(new AirColumnRequest.Segment(DemoWhistle.BLANK_LENGTH_MM, DemoWhistle.BORE_MM, DemoWhistle.BORE_MM)),
                InputEnd.OPEN, OutputEnd.OPEN_UNFLANGED, null, DemoWhistle.TEMPERATURE_C, DemoWhistle.HUMIDITY_PCT, true,
                300.0, 3000.0, 3000, EqualTemperament.ISO_16_A4_HZ, null, null, window, null);
        ToneHoleSolveRequest.Limits limits = new ToneHoleSolveRequest.Limits(40.0, 10.0, 3.0, 3.0, 11.0, true, true,
                200.0, DemoWhistle.BLANK_LENGTH_MM);
        return new BlankTubeRequest(bore, DemoWhistle.POSITIONS_MM.size(), DemoWhistle.CHIMNEY_MM, fingerings, null,
                limits, null, null, new BlankTubeRequest.MouthLimits(true, 0.0, DemoWhistle.BORE_MM, null, null, null));
    }
}
