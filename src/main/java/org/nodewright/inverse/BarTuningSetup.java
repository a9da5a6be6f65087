package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM;

import java.util.function.Function;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.bars.BarMapper;
import org.nodewright.physics.bars.Bar;
import org.nodewright.physics.bars.TuningLimits;
import org.nodewright.physics.bars.TuningTargets;
import org.nodewright.physics.bars.UndercutTuner;
import org.nodewright.strings.StringRules;

/** A validated bar-tuning request turned into the undercut solve's work. */
final class BarTuningSetup {

    private BarTuningSetup() {
    }

    /** The job's work for {@link SolveJobs#accepted}: the undercut solve of a request that passed validation. */
    static Function<SolveJob, Object> work(BarTuningRequest request) {
        BarAnalysisRequest barRequest = request.bar();
        Bar blank = BarMapper.toBar(barRequest);
        double f1 = StringRules.pitchHz(request.note(), request.targetHz(), barRequest.referenceA4OrDefault());
        double[] ratios = request.ratiosOrDefault().stream().mapToDouble(Double::doubleValue).toArray();
        TuningTargets targets = new TuningTargets(f1, ratios);
        TuningLimits limits = new TuningLimits(request.minimumThicknessMm() * MM, request.flatEndMm() * MM,
                request.minLengthMm() * MM, request.maxLengthMm() * MM);
        double tolerance = request.toleranceCents() == null ? BarTuningRequest.DEFAULT_TOLERANCE_CENTS
                : request.toleranceCents();
        int cap = request.maxEvaluations() == null ? BarTuningRequest.DEFAULT_MAX_EVALUATIONS : request.maxEvaluations();
        return j -> BarTuningResult.of(new UndercutTuner(tolerance, cap).solve(
                blank, barRequest.theoryOrDefault(), targets, limits, null, j, j::cancelRequested), targets,
                barRequest.theoryOrDefault(), barRequest);
    }
}
