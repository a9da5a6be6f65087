package org.nodewright.inverse;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.time.Instant;
import org.nodewright.physics.inverse.SolveProgress;

/** One queued or running or finished solve; all state changes are synchronised on the job. */
final class SolveJob implements SolveProgress {

    enum Status {
        @JsonProperty("queued") QUEUED,
        @JsonProperty("running") RUNNING,
        @JsonProperty("succeeded") SUCCEEDED,
        @JsonProperty("failed") FAILED,
        @JsonProperty("cancelled") CANCELLED;

        boolean finished() {
            return this == SUCCEEDED || this == FAILED || this == CANCELLED;
        }
    }

    private final String id;
    private final String kind;
    private final Instant createdAt;
    private Status status = Status.QUEUED;
    private volatile boolean cancelRequested;
    private Instant startedAt;
    private Instant finishedAt;
    private int evaluations;
    private int maxEvaluations;
    private double worstCents = Double.NaN;
    private Object result;
    private String error;

    SolveJob(String id, String kind, Instant createdAt) {
        this.id = id;
        this.kind = kind;
        this.createdAt = createdAt;
    }

    String id() {
        return id;
    }

    Instant createdAt() {
        return createdAt;
    }

    boolean cancelRequested() {
        return cancelRequested;
    }

    synchronized Status status() {
        return status;
    }

    synchronized boolean start(Instant now) {
        if (status != Status.QUEUED) {
            return false;
        }
        status = Status.RUNNING;
        startedAt = now;
        return true;
    }

    @Override
    public synchronized void update(int evaluationsSoFar, int cap, double worst) {
        evaluations = evaluationsSoFar;
        maxEvaluations = cap;
        worstCents = worst;
    }

    synchronized void succeed(Object value, Instant now) {
        if (status == Status.RUNNING) {
            status = Status.SUCCEEDED;
            result = value;
            finishedAt = now;
        }
    }

    synchronized void fail(String message, Instant now) {
        status = Status.FAILED;
        error = message;
        finishedAt = now;
    }

    synchronized void markCancelled(Instant now) {
        status = Status.CANCELLED;
        finishedAt = now;
    }

    synchronized void requestCancel(Instant now) {
        cancelRequested = true;
        if (status == Status.QUEUED) {
            markCancelled(now);
        }
    }

    /** The job as the API shows it. */
    synchronized View view() {
        Double worst = Double.isFinite(worstCents) ? worstCents : null;
        Double elapsed = startedAt == null ? null
                : ((finishedAt == null ? Instant.now() : finishedAt).toEpochMilli() - startedAt.toEpochMilli()) / 1000.0;
        return new View(id, kind, status, new Progress(evaluations, maxEvaluations,
                maxEvaluations == 0 ? 0.0 : Math.min(1.0, (double) evaluations / maxEvaluations), worst),
                createdAt.toString(), elapsed, status == Status.SUCCEEDED ? result : null, error);
    }

    record Progress(int evaluations, int maxEvaluations, double fraction, Double worstCents) {
    }

    record View(String id, String kind, Status status, Progress progress, String createdAt, Double elapsedSeconds,
            Object result, String error) {
    }
}
