package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.nodewright.aircolumns.AirColumnMapper;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.CalibrationParameter;
import org.nodewright.physics.inverse.Calibrator;
import org.nodewright.physics.inverse.SolveCancelledException;
import org.nodewright.physics.measure.ImpedanceCsvReader;
import org.nodewright.physics.measure.ImpedanceCurve;
import org.nodewright.physics.measure.ImpedancePeak;
import org.nodewright.physics.measure.ImpedancePeakFinder;
import org.nodewright.physics.measure.UnreadableInputException;
import org.nodewright.physics.tuning.Cents;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;

/**
 * The calibration's parameters as request fields: each one's field path, start, bounds, and how a
 * value goes into the bore request (then mapped, as every bore, by {@link AirColumnMapper}).
 */
final class CalibrationSetup {

    /** Air temperature inside the instrument, C: the range a played instrument sees (common practice). */
    static final double MIN_TEMPERATURE_C = -10;
    static final double MAX_TEMPERATURE_C = 45;
    /** A breath's temperatures may be shifted by up to this much, C. */
    static final double MAX_BREATH_SHIFT_C = 15;

    /** The calibration's evaluation cap. */
    static final int MAX_EVALUATIONS = 400;

    record Parameter(CalibrationParameter kind, String field, String unit, double start, double lower, double upper) {
    }

    private CalibrationSetup() {
    }

    static List<Parameter> parameters(CalibrationRequest r) {
        AirColumnRequest b = r.bore();
        List<Parameter> out = new ArrayList<>();
        for (CalibrationParameter p : r.fitOrDefault()) {
            if (p == CalibrationParameter.AIR_TEMPERATURE) {
                if (b.breath() != null) {
                    out.add(new Parameter(p, "breath.inputTemperatureC+outputTemperatureC (shift)", "C", 0,
                            -MAX_BREATH_SHIFT_C, MAX_BREATH_SHIFT_C));
                } else {
                    out.add(new Parameter(p, "temperatureC", "C", b.temperatureOrDefault(), MIN_TEMPERATURE_C,
                            MAX_TEMPERATURE_C));
                }
                continue;
            }
            AirColumnRequest.MouthSpec m = b.mouth();
            out.add(switch (m.kind()) {
                case WINDOW -> new Parameter(p, "mouth.windowLengthMm", "mm", m.windowLengthMm(),
                        0.25 * m.windowLengthMm(), Math.min(500, 3 * m.windowLengthMm()));
                case EMBOUCHURE -> new Parameter(p, "mouth.lipCoveragePct", "%",
                        m.lipCoveragePct() == null ? 0 : m.lipCoveragePct(), 0, 80);
                case REED -> new Parameter(p, "mouth.equivalentVolumeMm3", "mm3", m.equivalentVolumeMm3(),
                        0.1 * m.equivalentVolumeMm3(), 10 * m.equivalentVolumeMm3());
                case CUP -> new Parameter(p, "mouth.cupVolumeMm3", "mm3", m.cupVolumeMm3(), 0.25 * m.cupVolumeMm3(),
                        4 * m.cupVolumeMm3());
            });
        }
        return out;
    }

    /** The bore with the parameters' values put in. */
    static AirColumnRequest with(AirColumnRequest b, List<Parameter> ps, double[] x) {
        AirColumnRequest.MouthSpec m = b.mouth();
        AirColumnRequest.BreathSpec breath = b.breath();
        Double temperature = b.temperatureC();
        for (int i = 0; i < ps.size(); i++) {
            double v = x[i];
            switch (ps.get(i).field()) {
                case "temperatureC" -> temperature = v;
                case "mouth.windowLengthMm" -> m = new AirColumnRequest.MouthSpec(m.kind(), m.holeDiameterMm(),
                        m.holeLengthMm(), m.holeWidthMm(), m.wallMm(), m.headspaceMm(), m.lipCoveragePct(), v,
                        m.windowWidthMm(), m.equivalentVolumeMm3(), m.cupVolumeMm3(), m.throatDiameterMm(),
                        m.throatLengthMm());
                case "mouth.lipCoveragePct" -> m = new AirColumnRequest.MouthSpec(m.kind(), m.holeDiameterMm(),
                        m.holeLengthMm(), m.holeWidthMm(), m.wallMm(), m.headspaceMm(), v, m.windowLengthMm(),
                        m.windowWidthMm(), m.equivalentVolumeMm3(), m.cupVolumeMm3(), m.throatDiameterMm(),
                        m.throatLengthMm());
                case "mouth.equivalentVolumeMm3" -> m = new AirColumnRequest.MouthSpec(m.kind(), m.holeDiameterMm(),
                        m.holeLengthMm(), m.holeWidthMm(), m.wallMm(), m.headspaceMm(), m.lipCoveragePct(),
                        m.windowLengthMm(), m.windowWidthMm(), v, m.cupVolumeMm3(), m.throatDiameterMm(),
                        m.throatLengthMm());
                case "mouth.cupVolumeMm3" -> m = new AirColumnRequest.MouthSpec(m.kind(), m.holeDiameterMm(),
                        m.holeLengthMm(), m.holeWidthMm(), m.wallMm(), m.headspaceMm(), m.lipCoveragePct(),
                        m.windowLengthMm(), m.windowWidthMm(), m.equivalentVolumeMm3(), v, m.throatDiameterMm(),
                        m.throatLengthMm());
                default -> breath = new AirColumnRequest.BreathSpec(breath.co2Pct(), breath.relativeHumidityPct(),
                        breath.inputTemperatureC() + v, breath.outputTemperatureC() + v);
            }
        }
        return new AirColumnRequest(b.segments(), b.inputEnd(), b.outputEnd(), b.holes(), temperature,
                b.relativeHumidityPct(), b.losses(), b.fMinHz(), b.fMaxHz(), b.points(), b.referenceA4Hz(),
                b.profileSamples(), b.fingerings(), m, breath);
    }

    /** The family of models: the bore with the values put in, mapped and asked for the fingering's pitch. */
    static Calibrator.Family family(AirColumnRequest b, List<Parameter> ps) {
        return (x, f, guess) -> BoreMapping.model(with(b, ps, x)).soundingHz(BoreMapping.layout(b), f, guess);
    }

    /** The measured fingerings, each with its measured pitch as the target the model is tracked from. */
    static List<Fingering> measured(CalibrationRequest r) {
        List<Fingering> chart = AirColumnMapper.fingerings(r.bore());
        List<AirColumnRequest.FingeringSpec> specs = r.bore().fingeringsOrEmpty();
        List<Fingering> out = new ArrayList<>();
        for (CalibrationRequest.Measured m : r.measuredOrEmpty()) {
            for (int i = 0; i < specs.size(); i++) {
                if (m.fingering().equals(specs.get(i).name())) {
                    Fingering f = chart.get(i);
                    out.add(new Fingering(m.fingering(), f.closedHoles(), m.measuredHz(), f.register()));
                    break;
                }
            }
        }
        return out;
    }

    /** The job's work for {@link SolveJobs#accepted}: the calibration of a request that passed validation. */
    static Function<SolveJob, Object> work(CalibrationRequest request) {
        List<Parameter> ps = parameters(request);
        List<Fingering> measured = new ArrayList<>(measured(request));
        double[] start = ps.stream().mapToDouble(Parameter::start).toArray();
        double[] lower = ps.stream().mapToDouble(Parameter::lower).toArray();
        double[] upper = ps.stream().mapToDouble(Parameter::upper).toArray();
        Calibrator.Family family = family(request.bore(), ps);
        Matched matched = match(request, family, start);
        if (request.impedance() != null && matched.fingerings().isEmpty()) {
            throw new BadRequestException("impedance.csv", "none of the curve's resonances lies near one of the model's");
        }
        measured.addAll(matched.fingerings());
        return j -> {
            int[] n = {0};
            Calibrator.Family watched = (x, f, g) -> {
                if (j.cancelRequested()) {
                    throw new SolveCancelledException();
                }
                j.update(++n[0] / Math.max(1, measured.size()), MAX_EVALUATIONS, Double.NaN);
                return family.soundingHz(x, f, g);
            };
            return CalibrationResult.of(new Calibrator(MAX_EVALUATIONS).fit(watched, start, lower, upper, measured), ps,
                    measured, request.bore(), matched.peaks());
        };
    }

    /** Name of the n-th measured impedance resonance among the calibration's notes. */
    static String peakName(int n) {
        return "impedance peak " + n;
    }

    /** The curve's phase unit: true for degrees, false for radians, null to take the header's word. */
    private static Boolean degrees(CalibrationRequest.MeasuredImpedance m) {
        return m.phaseUnit() == null ? null : "deg".equals(m.phaseUnit());
    }

    /** The playing resonances of the measured curve (minima for an open input end, maxima for a closed one), lowest first. */
    static List<ImpedancePeak> peaks(CalibrationRequest r) {
        CalibrationRequest.MeasuredImpedance m = r.impedance();
        ImpedanceCurve curve = ImpedanceCsvReader.read(m.csv(), degrees(m));
        boolean minima = r.bore().inputEnd() == org.nodewright.physics.aircolumn.InputEnd.OPEN;
        List<ImpedancePeak> all = ImpedancePeakFinder.find(curve, minima, m.prominenceOrDefault());
        return all.subList(0, Math.min(all.size(), m.maxPeaksOrDefault()));
    }

    /** The impedance's rules: a known fingering and phase unit, a readable curve with at least one resonance. */
    static void impedanceProblems(List<FieldProblem> out, CalibrationRequest r, java.util.Set<String> names) {
        CalibrationRequest.MeasuredImpedance m = r.impedance();
        if (m.fingering() != null && !names.contains(m.fingering())) {
            out.add(new FieldProblem("impedance.fingering", "no fingering named '" + m.fingering() + "' in bore.fingerings"));
        }
        if (m.phaseUnit() != null && !m.phaseUnit().equals("rad") && !m.phaseUnit().equals("deg")) {
            out.add(new FieldProblem("impedance.phaseUnit", "must be \"rad\" or \"deg\""));
            return;
        }
        if (m.csv() == null || m.csv().isEmpty() || m.csv().length() > CalibrationRequest.MAX_CSV_CHARS
                || r.bore().inputEnd() == null
                || (m.minProminenceDb() != null && !(m.minProminenceDb() >= 0 && m.minProminenceDb() <= 60))
                || (m.maxPeaks() != null && (m.maxPeaks() < 1 || m.maxPeaks() > 20))) {
            return; // the field's own constraint speaks
        }
        try {
            if (peaks(r).isEmpty()) {
                out.add(new FieldProblem("impedance.csv", "no " + (r.bore().inputEnd()
                        == org.nodewright.physics.aircolumn.InputEnd.OPEN ? "minimum" : "maximum")
                        + " of the curve stands out by " + FieldProblem.figure(m.prominenceOrDefault())
                        + " dB (impedance.minProminenceDb); the player's end is " + r.bore().inputEnd()));
            }
        } catch (UnreadableInputException e) {
            out.add(new FieldProblem("impedance.csv", e.getMessage()));
        }
    }

    /** A measured resonance of the curve and what became of it. */
    record Peak(int n, double measuredHz, double prominenceDb, boolean used, String note) {
    }

    /** The measured curve's resonances matched to the model's, and the fingerings the fit tracks them as. */
    record Matched(List<Peak> peaks, List<Fingering> fingerings) {
    }

    /**
     * Each measured resonance paired with the model's resonance nearest it (the one the model's
     * search from the measured frequency climbs to, at the start values); a measured resonance
     * whose model partner is already taken by a lower one, or that has none within a factor 1.4,
     * is left out of the fit and said so.
     */
    static Matched match(CalibrationRequest r, Calibrator.Family family, double[] start) {
        if (r.impedance() == null) {
            return new Matched(List.of(), List.of());
        }
        java.util.Set<Integer> closed = new java.util.TreeSet<>();
        String name = r.impedance().fingering();
        if (name != null) {
            List<AirColumnRequest.FingeringSpec> specs = r.bore().fingeringsOrEmpty();
            List<Fingering> chart = AirColumnMapper.fingerings(r.bore());
            for (int i = 0; i < specs.size(); i++) {
                if (name.equals(specs.get(i).name())) {
                    closed.addAll(chart.get(i).closedHoles());
                    break;
                }
            }
        } else {
            List<AirColumnRequest.Hole> holes = r.bore().holesOrEmpty();
            for (int i = 0; i < holes.size(); i++) {
                if (Boolean.FALSE.equals(holes.get(i).open())) {
                    closed.add(i);
                }
            }
        }
        List<Peak> peaks = new ArrayList<>();
        List<Fingering> fingerings = new ArrayList<>();
        double lastModel = 0;
        List<ImpedancePeak> found = peaks(r);
        for (int i = 0; i < found.size(); i++) {
            ImpedancePeak p = found.get(i);
            Fingering f = new Fingering(peakName(i + 1), closed, p.frequencyHz(), i + 1);
            double model = family.soundingHz(start, f, p.frequencyHz());
            String note;
            if (!Double.isFinite(model)) {
                note = "the model has no resonance near it";
            } else if (lastModel > 0 && Math.abs(Cents.between(model, lastModel)) < 1) {
                note = "nearest the same model resonance as the one below it";
            } else {
                note = null;
                lastModel = model;
                fingerings.add(f);
            }
            peaks.add(new Peak(i + 1, p.frequencyHz(), p.prominenceDb(), note == null, note));
        }
        return new Matched(peaks, fingerings);
    }
}
