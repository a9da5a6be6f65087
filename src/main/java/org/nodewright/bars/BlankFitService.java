package org.nodewright.bars;

import java.util.List;
import org.nodewright.physics.bars.Bar;
import org.nodewright.physics.bars.BlankFit;
import org.nodewright.physics.bars.BlankFitter;
import org.nodewright.physics.bars.BeamTheory;
import org.nodewright.physics.bars.MeasuredMode;
import org.nodewright.physics.measure.SpectralPeak;
import org.nodewright.web.BadRequestException;
import org.springframework.stereotype.Service;

/** Measure the blank: fits E (and G) to typed or recorded bending modes of a tapped bar. */
@Service
public class BlankFitService {

    /** Caution code: the fit is only as good as the blank's measured density and dimensions. */
    static final String CAUTION_WEIGH_THE_BLANK = "weigh-the-blank";
    /** Caution code: G could not be told from these modes and was left at its starting value. */
    static final String CAUTION_SHEAR_KEPT = "shear-kept";
    /** Caution code: as many modes as fitted moduli, so the fit is exact by construction and checks nothing. */
    static final String CAUTION_EXACT_FIT = "exact-fit";

    BlankFitResponse fit(BlankFitRequest r) {
        List<MeasuredMode> modes = r.modes().stream().map(h -> new MeasuredMode(h.n(), h.frequencyHz())).toList();
        return fit(r.bar(), modes, r.fitShearOn(), null);
    }

    /** From a recording's peaks: numbered by the bar's own mode ratios, then fitted. */
    BlankFitResponse fitPeaks(BarAnalysisRequest barRequest, List<SpectralPeak> peaks, int modeCount, boolean fitShear) {
        Bar bar = BarMapper.toBar(barRequest);
        double[] hz = peaks.stream().mapToDouble(SpectralPeak::frequencyHz).toArray();
        double[] db = peaks.stream().mapToDouble(SpectralPeak::levelDb).toArray();
        List<MeasuredMode> modes = BlankFitter.match(bar, barRequest.theoryOrDefault(), hz, db, modeCount);
        if (modes.isEmpty()) {
            throw new BadRequestException("file", "no spectral peaks were found in the recording");
        }
        return fit(barRequest, modes, fitShear, peaks);
    }

    private BlankFitResponse fit(BarAnalysisRequest barRequest, List<MeasuredMode> modes, boolean fitShear,
            List<SpectralPeak> peaks) {
        Bar bar = BarMapper.toBar(barRequest);
        BeamTheory theory = barRequest.theoryOrDefault();
        BlankFit fit = BadRequestException.whenComputing("modes", "the moduli could not be fitted to these modes",
                () -> BlankFitter.fit(bar, theory, modes, fitShear));
        BarAnalysisRequest fitted = new BarAnalysisRequest(barRequest.lengthMm(), barRequest.section(),
                barRequest.widthMm(), barRequest.thicknessMm(), barRequest.diameterMm(), barRequest.boreMm(),
                barRequest.profile(), barRequest.material(), barRequest.densityKgPerM3(), fit.youngsModulus(),
                fit.shearModulus(), barRequest.ends(), barRequest.theory(), barRequest.modeCount(),
                barRequest.referenceA4Hz(), barRequest.otherFamilies());
        List<String> cautions = new java.util.ArrayList<>();
        cautions.add(CAUTION_WEIGH_THE_BLANK);
        if (!fit.shearFitted()) {
            cautions.add(CAUTION_SHEAR_KEPT);
        }
        if (fit.matches().size() == (fit.shearFitted() ? 2 : 1)) {
            cautions.add(CAUTION_EXACT_FIT);
        }
        return new BlankFitResponse(fit.youngsModulus(), fit.shearModulus(), fit.shearFitted(), bar.density(),
                bar.youngsModulus(), bar.shearModulus(), fit.rmsCents(),
                fit.matches().stream().map(m -> new BlankFitResponse.MatchJson(m.n(), m.measuredHz(), m.modelHz(),
                        m.centsOff())).toList(),
                peaks == null ? null : peaks.stream().map(p -> new BlankFitResponse.PeakJson(p.frequencyHz(),
                        p.levelDb())).toList(),
                fitted, cautions);
    }
}
