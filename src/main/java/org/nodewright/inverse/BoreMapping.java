package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.templates.ToneHoleTemplate;

/** The bore bench's request (millimetres) to the template and solver cores, and back. */
public final class BoreMapping {

    private static final double MM = 1e-3;

    private BoreMapping() {
    }

    public static ToneHoleTemplate template(AirColumnRequest r, String name) {
        return new ToneHoleTemplate(name,
                r.segments().stream().map(s -> new ToneHoleTemplate.Section(s.lengthMm(), s.inputDiameterMm(),
                        s.outputDiameterMm())).toList(),
                holes(r).stream().map(h -> new ToneHoleTemplate.Hole(h.positionMm(), h.diameterMm())).toList());
    }

    static List<AirColumnRequest.Hole> holes(AirColumnRequest r) {
        return r.holes() == null ? List.of() : r.holes();
    }

    static double lengthMm(AirColumnRequest r) {
        return r.segments().stream().mapToDouble(AirColumnRequest.Segment::lengthMm).sum();
    }

    static HoleLayout layout(AirColumnRequest r) {
        List<AirColumnRequest.Hole> hs = holes(r);
        double[] pos = new double[hs.size()];
        double[] dia = new double[hs.size()];
        for (int i = 0; i < hs.size(); i++) {
            pos[i] = hs.get(i).positionMm();
            dia[i] = hs.get(i).diameterMm();
        }
        return new HoleLayout(pos, dia, r.segments().get(r.segments().size() - 1).lengthMm());
    }

    static AirCoreFrequencyModel model(AirColumnRequest r) {
        List<BoreSegment> segs = new ArrayList<>();
        for (AirColumnRequest.Segment s : r.segments()) {
            segs.add(new BoreSegment(s.lengthMm() * MM, s.inputDiameterMm() * MM / 2, s.outputDiameterMm() * MM / 2));
        }
        double[] chimneys = holes(r).stream().mapToDouble(h -> h.chimneyMm()).toArray();
        AirProperties air = AirProperties.at(r.temperatureC() == null ? 20.0 : r.temperatureC(),
                r.relativeHumidityPct() == null ? 0.0 : r.relativeHumidityPct());
        return new AirCoreFrequencyModel(segs, chimneys, InputEnd.valueOf(r.inputEnd().name()),
                OutputEnd.valueOf(r.outputEnd().name()), air, r.losses() == null || r.losses());
    }

    /** The request with the solved holes and foot: what "apply" hands back to the bore bench. */
    static AirColumnRequest applied(AirColumnRequest r, HoleLayout layout) {
        List<AirColumnRequest.Segment> segs = new ArrayList<>(r.segments());
        AirColumnRequest.Segment foot = segs.get(segs.size() - 1);
        segs.set(segs.size() - 1, new AirColumnRequest.Segment(layout.footLengthMm(), foot.inputDiameterMm(),
                foot.outputDiameterMm()));
        List<AirColumnRequest.Hole> hs = new ArrayList<>();
        List<AirColumnRequest.Hole> old = holes(r);
        for (int i = 0; i < old.size(); i++) {
            hs.add(new AirColumnRequest.Hole(layout.position(i), layout.diameter(i), old.get(i).chimneyMm(),
                    old.get(i).open()));
        }
        return new AirColumnRequest(segs, r.inputEnd(), r.outputEnd(), hs, r.temperatureC(), r.relativeHumidityPct(),
                r.losses(), r.fMinHz(), r.fMaxHz(), r.points(), r.referenceA4Hz(), r.profileSamples(), r.fingerings());
    }
}
