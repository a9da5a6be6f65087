package org.nodewright.measurements;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Positive;
import java.util.List;
import org.nodewright.physics.measure.ImpedanceCsvReader;
import org.nodewright.physics.measure.ImpedanceCurve;
import org.nodewright.physics.measure.ImpedancePeakFinder;
import org.nodewright.physics.measure.MatchedPartial;
import org.nodewright.physics.measure.MonoRecording;
import org.nodewright.physics.measure.PartialAnalyzer;
import org.nodewright.physics.measure.PartialFit;
import org.nodewright.physics.measure.PartialsCsvReader;
import org.nodewright.physics.measure.PeakFinder;
import org.nodewright.physics.measure.SpectralPeak;
import org.nodewright.physics.measure.StiffStringFit;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.Finite;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RequestPart;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;

/**
 * Measured partials from a WAV recording or a CSV table, and a measured impedance curve from a
 * CSV table. Uploads are multipart/form-data with the file in the part {@code file}; the size
 * limit (50 MB) is enforced by the servlet container before the body is read (see
 * application.properties). Every unreadable file is a 400 naming {@code file}.
 */
@RestController
@RequestMapping("/api/v1/measurements")
class MeasurementsController {

    @PostMapping(path = "/partials", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    PartialsResponse partials(@RequestPart("file") MultipartFile file,
            @RequestParam(required = false) @Finite @Positive @DecimalMax("20000") Double expectedF1Hz,
            @RequestParam(required = false) @Min(2) @Max(200) Integer maxPartials) {
        MonoRecording recording = Uploads.recording(file);
        PartialFit fit = Uploads.read(
                () -> PartialAnalyzer.analyze(recording, expectedF1Hz, partialsOrDefault(maxPartials)));
        return PartialsResponse.of(recording.sampleRateHz(), recording.durationSeconds(), "wav", fit, true);
    }

    /**
     * The strongest spectral peaks of a WAV recording (the first step of the partials analysis, {@link PeakFinder}),
     * unnamed and in ascending frequency: for sounds that are no harmonic series, like a tapped plate.
     */
    @PostMapping(path = "/peaks", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    PeaksResponse peaks(@RequestPart("file") MultipartFile file,
            @RequestParam(required = false) @Min(1) @Max(200) Integer maxPeaks,
            @RequestParam(required = false) @Finite @Positive @DecimalMax("20000") Double minHz,
            @RequestParam(required = false) @Finite @Positive @DecimalMax("24000") Double maxHz) {
        MonoRecording recording = Uploads.recording(file);
        int count = maxPeaks == null ? PeaksResponse.DEFAULT_PEAKS : maxPeaks;
        double lo = minHz == null ? 0 : minHz;
        double hi = maxHz == null ? Double.POSITIVE_INFINITY : maxHz;
        List<SpectralPeak> all = Uploads.read(() -> PeakFinder.find(recording, PeaksResponse.SEARCHED));
        List<PeaksResponse.Peak> kept = all.stream()
                .filter(p -> p.frequencyHz() >= lo && p.frequencyHz() <= hi)
                .sorted(java.util.Comparator.comparingDouble(SpectralPeak::levelDb).reversed())
                .limit(count)
                .sorted(java.util.Comparator.comparingDouble(SpectralPeak::frequencyHz))
                .map(p -> new PeaksResponse.Peak(p.frequencyHz(), p.levelDb()))
                .toList();
        return new PeaksResponse(recording.sampleRateHz(), recording.durationSeconds(), kept);
    }

    @PostMapping(path = "/partials-csv", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    PartialsResponse partialsCsv(@RequestPart("file") MultipartFile file,
            @RequestParam(required = false) @Finite @Positive @DecimalMax("20000") Double expectedF1Hz,
            @RequestParam(required = false) @Min(2) @Max(200) Integer maxPartials) {
        List<PartialsCsvReader.Row> rows = Uploads.read(() -> PartialsCsvReader.read(Uploads.text(file)));
        int limit = partialsOrDefault(maxPartials);
        PartialFit fit;
        if (rows.get(0).n() > 0) {
            List<MatchedPartial> partials = rows.stream()
                    .filter(r -> r.n() <= limit)
                    .map(r -> new MatchedPartial(r.n(), r.frequencyHz(), 0.0))
                    .toList();
            fit = Uploads.read(() -> StiffStringFit.fit(partials));
        } else {
            List<SpectralPeak> peaks = rows.stream().map(r -> new SpectralPeak(r.frequencyHz(), 0.0)).toList();
            fit = Uploads.read(() -> PartialAnalyzer.fitPeaks(peaks, expectedF1Hz, limit));
        }
        return PartialsResponse.of(null, null, "csv", fit, false);
    }

    @PostMapping(path = "/impedance", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    ImpedanceResponse impedance(@RequestPart("file") MultipartFile file,
            @RequestParam(required = false) String phaseUnit,
            @RequestParam(required = false) String inputEnd,
            @RequestParam(required = false) @Finite @DecimalMin("0") @DecimalMax("60") Double minProminenceDb) {
        Boolean degrees = switch (phaseUnit == null ? "" : phaseUnit) {
            case "" -> null;
            case "rad" -> false;
            case "deg" -> true;
            default -> throw new BadRequestException("phaseUnit", "must be \"rad\" or \"deg\"");
        };
        boolean open = switch (inputEnd == null ? "closed" : inputEnd) {
            case "closed" -> false;
            case "open" -> true;
            default -> throw new BadRequestException("inputEnd", "must be \"closed\" or \"open\"");
        };
        double prominence = minProminenceDb == null ? 3.0 : minProminenceDb;
        ImpedanceCurve curve = Uploads.read(() -> ImpedanceCsvReader.read(Uploads.text(file), degrees));
        return ImpedanceResponse.of(curve, ImpedancePeakFinder.find(curve, false, prominence),
                ImpedancePeakFinder.find(curve, true, prominence), open);
    }

    private static int partialsOrDefault(Integer maxPartials) {
        return maxPartials == null ? PartialAnalyzer.DEFAULT_MAX_PARTIALS : maxPartials;
    }
}
