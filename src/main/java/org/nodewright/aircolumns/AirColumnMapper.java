package org.nodewright.aircolumns;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import org.nodewright.physics.aircolumn.AirColumn;
import org.nodewright.physics.aircolumn.AirColumnAnalysis;
import org.nodewright.physics.aircolumn.AirColumnAnalyzer;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.Breath;
import org.nodewright.physics.aircolumn.Mouth;
import org.nodewright.physics.aircolumn.MouthEffect;
import org.nodewright.physics.aircolumn.Resonance;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.StandingWaveProfile;
import org.nodewright.physics.aircolumn.ToneHole;
import org.nodewright.physics.tuning.Note;
import org.nodewright.physics.tuning.NoteNames;
import org.nodewright.web.EnumWords;

/**
 * The one mapper between the air-column request and the core: a validated request (millimetres,
 * defaults for omitted fields) to core values (metres), and the analysis back to JSON. Every
 * feature that reads an air-column request (the bore bench, the tone-hole solver, the drilling
 * template) maps it here; a new request field gets its default and its mapping here too.
 */
public final class AirColumnMapper {

    private AirColumnMapper() {
    }

    /** The bore's segments from the input end, radii in metres. */
    public static List<BoreSegment> segments(AirColumnRequest r) {
        List<BoreSegment> segs = new ArrayList<>();
        for (AirColumnRequest.Segment s : r.segments()) {
            segs.add(new BoreSegment(s.lengthMm() * MM, s.inputDiameterMm() * MM / 2, s.outputDiameterMm() * MM / 2));
        }
        return segs;
    }

    /** The side holes (a hole is open unless {@code open} is false). */
    public static List<ToneHole> holes(AirColumnRequest r) {
        List<ToneHole> holes = new ArrayList<>();
        for (AirColumnRequest.Hole h : r.holesOrEmpty()) {
            holes.add(new ToneHole(h.positionMm() * MM, h.diameterMm() * MM / 2, h.chimneyMm() * MM,
                    h.open() == null || h.open()));
        }
        return holes;
    }

    /** The core mouth of a request's (validated) mouth, or null. */
    public static Mouth mouth(AirColumnRequest.MouthSpec m) {
        if (m == null) {
            return null;
        }
        return switch (m.kind()) {
            case EMBOUCHURE -> {
                double l = m.holeDiameterMm() != null ? m.holeDiameterMm() : m.holeLengthMm();
                double w = m.holeDiameterMm() != null ? m.holeDiameterMm() : m.holeWidthMm();
                yield new Mouth.Embouchure(l * MM, w * MM, m.wallMm() * MM, m.headspaceMm() * MM,
                        m.lipCoveragePct() == null ? 0 : m.lipCoveragePct() / 100);
            }
            case WINDOW -> new Mouth.Window(m.windowLengthMm() * MM, m.windowWidthMm() * MM, m.wallMm() * MM,
                    m.headspaceMm() == null ? 0 : m.headspaceMm() * MM);
            case REED -> new Mouth.Reed(m.equivalentVolumeMm3() * MM * MM * MM);
            case CUP -> new Mouth.Cup(m.cupVolumeMm3() * MM * MM * MM, m.throatDiameterMm() * MM / 2,
                    m.throatLengthMm() * MM);
        };
    }

    /** The core breath of a request's (validated) breath, or null. */
    public static Breath breath(AirColumnRequest.BreathSpec b) {
        return b == null ? null : new Breath(b.co2Pct() / 100, b.relativeHumidityPct(), b.inputTemperatureC(),
                b.outputTemperatureC());
    }

    /** The air in the bore: 20 °C and 0 % relative humidity unless given. */
    public static AirProperties air(AirColumnRequest r) {
        return AirProperties.at(r.temperatureOrDefault(), r.humidityOrDefault());
    }

    /** The whole bore as the core analyses it. */
    public static AirColumn column(AirColumnRequest r) {
        return new AirColumn(segments(r), holes(r), r.inputEnd(), r.outputEnd(), air(r), r.lossesOrDefault(),
                mouth(r.mouth()), breath(r.breath()));
    }

    /** The analyzer for this request's note reference and profile sampling. */
    public static AirColumnAnalyzer analyzer(AirColumnRequest r) {
        return new AirColumnAnalyzer(r.referenceA4OrDefault(), r.profileSamplesOrDefault());
    }

    /**
     * The fingerings with their targets in hertz ({@code targetNote} read at the request's A4) and
     * their register (1 unless given); names as given.
     */
    public static List<Fingering> fingerings(AirColumnRequest r) {
        List<Fingering> out = new ArrayList<>();
        for (AirColumnRequest.FingeringSpec f : r.fingeringsOrEmpty()) {
            double target = f.targetHz() != null ? f.targetHz()
                    : NoteNames.pitchHz(f.targetNote(), r.referenceA4OrDefault());
            out.add(new Fingering(f.name(), new HashSet<>(f.closedHoles()), target,
                    f.register() == null ? 1 : f.register()));
        }
        return out;
    }

    /**
     * The analysis as the JSON answer of {@code POST /api/v1/air-columns/analyze}, with the core's
     * warnings as worded by {@link AirColumnWording}.
     */
    public static AirColumnResponse response(AirColumnRequest req, AirColumnAnalysis a, List<String> warnings) {
        AirProperties air = a.air();
        List<AirColumnResponse.ResonanceItem> items = new ArrayList<>();
        List<AirColumnResponse.Profile> profiles = new ArrayList<>();
        for (AirColumnAnalysis.ResonanceResult rr : a.resonances()) {
            StandingWaveProfile p = rr.profile();
            items.add(new AirColumnResponse.ResonanceItem(rr.resonance().n(), rr.resonance().frequencyHz(),
                    finiteOrNull(rr.resonance().q()), finiteOrNull(rr.resonance().magnitude()), note(rr.note()),
                    rr.ratioToFirst(),
                    rr.seriesMember(), rr.centsFromSeries(), mm(p.pressureNodes()), mm(p.pressureAntinodes()),
                    a.mouth() == null ? null : finiteOrNull(a.mouth().resonanceCents().get(items.size()))));
            double[] x = new double[p.positions().length];
            for (int i = 0; i < x.length; i++) {
                x[i] = p.positions()[i] / MM;
            }
            profiles.add(new AirColumnResponse.Profile(rr.resonance().n(), rr.resonance().frequencyHz(), x,
                    p.pressure(), p.flow()));
        }
        List<AirColumnResponse.FingeringItem> fs = new ArrayList<>();
        List<AirColumnRequest.FingeringSpec> specs = req.fingeringsOrEmpty();
        for (int i = 0; i < a.fingerings().size(); i++) {
            AirColumnAnalysis.FingeringResult f = a.fingerings().get(i);
            fs.add(new AirColumnResponse.FingeringItem(i, f.fingering().name(), specs.get(i).closedHoles(),
                    f.fingering().targetHz(), f.fingering().register(), finiteOrNull(f.predictedHz()),
                    finiteOrNull(f.centsFromTarget()), f.note() == null ? null : note(f.note()), finiteOrNull(f.q())));
        }
        return new AirColumnResponse(a.speedOfSound(),
                new AirColumnResponse.Air(air.temperatureC(), air.relativeHumidityPct(), air.density(),
                        air.viscosity(), air.thermalConductivity(), air.gamma(), air.specificHeatCp(), along(a)),
                items, new AirColumnResponse.Impedance(a.frequencyHz(), finite(a.magnitude()), finite(a.phaseRad())),
                EnumWords.word(a.series()), profiles, fs, warnings, mouth(a));
    }

    private static List<AirColumnResponse.AirAlongBore> along(AirColumnAnalysis a) {
        if (a.airAlongBore().isEmpty()) {
            return null;
        }
        return a.airAlongBore().stream().map(p -> new AirColumnResponse.AirAlongBore(p.position() / MM,
                p.air().temperatureC(), p.air().relativeHumidityPct(), p.co2MoleFraction() * 100,
                p.air().speedOfSound(), p.air().density(), p.air().viscosity(), p.air().thermalConductivity(),
                p.air().gamma())).toList();
    }

    private static AirColumnResponse.Mouth mouth(AirColumnAnalysis a) {
        MouthEffect m = a.mouth();
        if (m == null) {
            return null;
        }
        List<AirColumnResponse.MouthResonance> rs = new ArrayList<>();
        for (int i = 0; i < a.resonances().size(); i++) {
            Resonance r = a.resonances().get(i).resonance();
            rs.add(new AirColumnResponse.MouthResonance(r.n(), r.frequencyHz(),
                    finiteOrNull(m.bareFrequencies().get(i)), finiteOrNull(m.resonanceCents().get(i))));
        }
        return new AirColumnResponse.Mouth(EnumWords.word(m.mouth().kind()),
                finiteOrNull(m.endCorrection() / MM), rs, finiteOrNull(m.helmholtzHz()),
                finiteOrNull(m.missingApexVolume() / (MM * MM * MM)));
    }

    private static AirColumnResponse.Note note(Note n) {
        return new AirColumnResponse.Note(n.name(), n.centsOff());
    }

    private static List<Double> mm(List<Double> metres) {
        return metres.stream().map(v -> v / MM).toList();
    }

    /**
     * JSON has no infinity: a lossless pole that lands exactly on a grid point is written as the
     * largest double (and an undefined phase as 0). Returns the array itself when all are finite.
     */
    private static double[] finite(double[] v) {
        double[] out = v;
        for (int i = 0; i < v.length; i++) {
            if (!Double.isFinite(v[i])) {
                if (out == v) {
                    out = v.clone();
                }
                out[i] = Double.isNaN(v[i]) ? 0 : Math.copySign(Double.MAX_VALUE, v[i]);
            }
        }
        return out;
    }

    private static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
