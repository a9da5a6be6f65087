package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnMapper;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.ModelFreedom;
import org.nodewright.physics.inverse.MouthFreedom;
import org.nodewright.physics.templates.ToneHoleTemplate;

/** The bore bench's request (millimetres) to the template and solver cores, and back. */
public final class BoreMapping {

    private BoreMapping() {
    }

    public static ToneHoleTemplate template(AirColumnRequest r, String name) {
        return new ToneHoleTemplate(name,
                r.segments().stream().map(s -> new ToneHoleTemplate.Section(s.lengthMm(), s.inputDiameterMm(),
                        s.outputDiameterMm())).toList(),
                holes(r).stream().map(h -> new ToneHoleTemplate.Hole(h.positionMm(), h.diameterMm())).toList());
    }

    static List<AirColumnRequest.Hole> holes(AirColumnRequest r) {
        return r.holesOrEmpty();
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

    /** The solver's frequency model of the bore, mapped (with its defaults) by {@link AirColumnMapper}. */
    static AirCoreFrequencyModel model(AirColumnRequest r) {
        double[] chimneys = holes(r).stream().mapToDouble(h -> h.chimneyMm()).toArray();
        return new AirCoreFrequencyModel(AirColumnMapper.segments(r), chimneys, r.inputEnd(), r.outputEnd(),
                AirColumnMapper.air(r), r.lossesOrDefault(), AirColumnMapper.mouth(r.mouth()),
                AirColumnMapper.breath(r.breath()));
    }

    /** The request with the player's end's figures a solve moved ({@code headspaceMm}, {@code windowLengthMm}). */
    static AirColumnRequest withMouth(AirColumnRequest r, List<ModelFreedom.Change> changes) {
        AirColumnRequest.MouthSpec m = r.mouth();
        if (changes.isEmpty() || m == null) {
            return r;
        }
        Double head = m.headspaceMm();
        Double window = m.windowLengthMm();
        for (ModelFreedom.Change c : changes) {
            switch (c.name()) {
                case MouthFreedom.HEADSPACE -> head = c.value();
                case MouthFreedom.WINDOW_LENGTH -> window = c.value();
                default -> throw new IllegalArgumentException("no mouth field " + c.name());
            }
        }
        AirColumnRequest.MouthSpec moved = new AirColumnRequest.MouthSpec(m.kind(), m.holeDiameterMm(), m.holeLengthMm(),
                m.holeWidthMm(), m.wallMm(), head, m.lipCoveragePct(), window, m.windowWidthMm(),
                m.equivalentVolumeMm3(), m.cupVolumeMm3(), m.throatDiameterMm(), m.throatLengthMm());
        return new AirColumnRequest(r.segments(), r.inputEnd(), r.outputEnd(), r.holes(), r.temperatureC(),
                r.relativeHumidityPct(), r.losses(), r.fMinHz(), r.fMaxHz(), r.points(), r.referenceA4Hz(),
                r.profileSamples(), r.fingerings(), moved, r.breath());
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
                r.losses(), r.fMinHz(), r.fMaxHz(), r.points(), r.referenceA4Hz(), r.profileSamples(), r.fingerings(),
                r.mouth(), r.breath());
    }
}
