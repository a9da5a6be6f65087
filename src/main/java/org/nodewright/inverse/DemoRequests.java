package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
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
        return new ToneHoleSolveRequest(bore, new ToneHoleSolveRequest.Limits(l.minPositionMm(), l.maxPositionMargin(),
                l.minSpacingMm(), l.minDiameterMm(), l.maxDiameterMm(), l.varyDiameters(), l.varyFoot(), l.minFootMm(),
                l.maxFootMm()), null, null);
    }
}
