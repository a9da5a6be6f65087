package org.nodewright.sharing;

import org.springframework.boot.diagnostics.AbstractFailureAnalyzer;
import org.springframework.boot.diagnostics.FailureAnalysis;

/** Turns a {@link LanSetupException} into a plain start-up message instead of a stack trace. */
class LanSetupFailureAnalyzer extends AbstractFailureAnalyzer<LanSetupException> {

    @Override
    protected FailureAnalysis analyze(Throwable rootFailure, LanSetupException cause) {
        return new FailureAnalysis(cause.getMessage(), cause.action(), cause);
    }
}
