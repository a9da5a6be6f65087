package org.nodewright.measurements;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Positive;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
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
import org.nodewright.physics.measure.UnreadableInputException;
import org.nodewright.physics.measure.WavReader;
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

    /** The file part's limit, as in spring.servlet.multipart.max-file-size. */
    static final long MAX_FILE_BYTES = 50L * 1024 * 1024;

    @PostMapping(path = "/partials", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    PartialsResponse partials(@RequestPart("file") MultipartFile file,
            @RequestParam(required = false) @Finite @Positive @DecimalMax("20000") Double expectedF1Hz,
            @RequestParam(required = false) @Min(2) @Max(200) Integer maxPartials) {
        MonoRecording recording = readFile(() -> WavReader.read(bytes(file)));
        PartialFit fit = readFile(() -> PartialAnalyzer.analyze(recording, expectedF1Hz, partialsOrDefault(maxPartials)));
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
        MonoRecording recording = readFile(() -> WavReader.read(bytes(file)));
        int count = maxPeaks == null ? PeaksResponse.DEFAULT_PEAKS : maxPeaks;
        double lo = minHz == null ? 0 : minHz;
        double hi = maxHz == null ? Double.POSITIVE_INFINITY : maxHz;
        List<SpectralPeak> all = readFile(() -> PeakFinder.find(recording, PeaksResponse.SEARCHED));
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
        List<PartialsCsvReader.Row> rows = readFile(() -> PartialsCsvReader.read(text(file)));
        int limit = partialsOrDefault(maxPartials);
        PartialFit fit;
        if (rows.get(0).n() > 0) {
            List<MatchedPartial> partials = rows.stream()
                    .filter(r -> r.n() <= limit)
                    .map(r -> new MatchedPartial(r.n(), r.frequencyHz(), 0.0))
                    .toList();
            fit = readFile(() -> StiffStringFit.fit(partials));
        } else {
            List<SpectralPeak> peaks = rows.stream().map(r -> new SpectralPeak(r.frequencyHz(), 0.0)).toList();
            fit = readFile(() -> PartialAnalyzer.fitPeaks(peaks, expectedF1Hz, limit));
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
        ImpedanceCurve curve = readFile(() -> ImpedanceCsvReader.read(text(file), degrees));
        return ImpedanceResponse.of(curve, ImpedancePeakFinder.find(curve, false, prominence),
                ImpedancePeakFinder.find(curve, true, prominence), open);
    }

    private static int partialsOrDefault(Integer maxPartials) {
        return maxPartials == null ? PartialAnalyzer.DEFAULT_MAX_PARTIALS : maxPartials;
    }

    private interface Reading<T> {
        T read() throws IOException;
    }

    /** Runs a read of the uploaded file; anything unreadable becomes a 400 on the field {@code file}. */
    private static <T> T readFile(Reading<T> reading) {
        try {
            return reading.read();
        } catch (UnreadableInputException e) {
            throw new BadRequestException("file", e.getMessage());
        } catch (IOException e) {
            throw new BadRequestException("file", "the upload could not be read");
        }
    }

    private static byte[] bytes(MultipartFile file) throws IOException {
        if (file.isEmpty()) {
            throw new UnreadableInputException("the file is empty");
        }
        if (file.getSize() > MAX_FILE_BYTES) {
            throw new UnreadableInputException("the file is larger than the upload limit of 50 MB");
        }
        return file.getBytes();
    }

    private static String text(MultipartFile file) throws IOException {
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes(file)))
                    .toString();
        } catch (CharacterCodingException e) {
            throw new UnreadableInputException("not a UTF-8 text table");
        }
    }
}
