package org.nodewright.bars;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import java.io.IOException;
import java.util.List;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.measure.MonoRecording;
import org.nodewright.physics.measure.PeakFinder;
import org.nodewright.physics.measure.SpectralPeak;
import org.nodewright.physics.measure.UnreadableInputException;
import org.nodewright.physics.measure.WavReader;
import org.nodewright.web.BadRequestException;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RequestPart;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;

/** Measure the blank: the moduli of a tapped bar from its bending modes, typed or recorded. */
@RestController
@Tag(name = "Bars")
class BlankFitController {

    /** Spectral peaks kept from a recording before they are numbered as the bar's modes. */
    static final int PEAKS = 64;

    private final BlankFitService fits;

    BlankFitController(BlankFitService fits) {
        this.fits = fits;
    }

    @PostMapping(path = "/api/v1/bars/measure-blank", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Fit Young's modulus (and the shear modulus) of a tapped blank to its measured bending modes",
            description = "Body: bar (as for /api/v1/bars/analyze: its geometry, density, ends and theory; its material "
                    + "or moduli are the fit's start), modes [{n, frequencyHz}] (bending modes through the thickness, "
                    + "1 = lowest), fitShear (default true: G is fitted when two or more modes are given, theory is "
                    + "timoshenko and the modes move by 10 cents or more per e-fold of G). Levenberg-Marquardt on the "
                    + "cents over ln E, ln G. Answer: the moduli, each mode beside the fitted model, and bar with the "
                    + "fitted youngsModulusPa and shearModulusPa written in.")
    BlankFitResponse typed(@Valid @RequestBody BlankFitRequest request) {
        return fits.fit(request);
    }

    @PostMapping(path = "/api/v1/bars/measure-blank/recording", consumes = MediaType.MULTIPART_FORM_DATA_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "As measure-blank, from a WAV recording of the tapped blank",
            description = "multipart/form-data: file (PCM WAV, as for /api/v1/measurements/partials), bar (JSON, "
                    + "application/json part). The recording's spectral peaks are numbered by the bar's own mode ratios "
                    + "(not a harmonic series), then fitted; ?modeCount= bending modes looked for (2..16, default 4), "
                    + "?fitShear= (default true).")
    BlankFitResponse recorded(@RequestPart("file") MultipartFile file,
            @Valid @RequestPart("bar") BarAnalysisRequest bar,
            @RequestParam(required = false) @Min(2) @Max(BarAnalyzer.MAX_MODES) Integer modeCount,
            @RequestParam(required = false) Boolean fitShear) {
        List<SpectralPeak> peaks;
        try {
            if (file.isEmpty()) {
                throw new UnreadableInputException("the file is empty");
            }
            MonoRecording recording = WavReader.read(file.getBytes());
            peaks = PeakFinder.find(recording, PEAKS);
        } catch (UnreadableInputException e) {
            throw new BadRequestException("file", e.getMessage());
        } catch (IOException e) {
            throw new BadRequestException("file", "the upload could not be read");
        }
        return fits.fitPeaks(bar, peaks, modeCount == null ? 4 : modeCount, fitShear == null || fitShear);
    }
}
