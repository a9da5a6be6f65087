package org.nodewright.inverse;

import jakarta.annotation.PreDestroy;
import java.net.URI;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Function;
import org.nodewright.physics.inverse.SolveCancelledException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.http.ResponseEntity;
import org.springframework.stereotype.Component;

/**
 * Long solves run here, one at a time on a single worker thread (the bench computer has few
 * cores and the page stays responsive), each polled by id and cancellable. Finished jobs are kept
 * for {@link #KEEP_FINISHED} entries, oldest dropped first; at most {@link #MAX_WAITING} may wait.
 */
@Component
class SolveJobs {

    static final int KEEP_FINISHED = 50;
    static final int MAX_WAITING = 8;

    private static final Logger log = LoggerFactory.getLogger(SolveJobs.class);

    private final Map<String, SolveJob> jobs = new ConcurrentHashMap<>();
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "nodewright-solver");
        t.setDaemon(true);
        t.setPriority(Thread.NORM_PRIORITY - 1);
        return t;
    });
    private final Clock clock = Clock.systemUTC();

    /** Thrown when too many solves are already waiting. */
    static final class Busy extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Busy() {
            super("too many solves are waiting; try again when one has finished");
        }
    }

    /** Where a job is polled and cancelled (GET and DELETE), followed by its id. */
    static final String JOB_PATH = "/api/v1/inverse/jobs/";

    /**
     * Queues a solve and answers as every solve endpoint does: 202 with the job and its
     * {@code Location}. A full queue throws {@link Busy}, answered 429 by {@link SolveJobsAdvice}.
     */
    ResponseEntity<SolveJob.View> accepted(String kind, Function<SolveJob, Object> work) {
        SolveJob job = submit(kind, work);
        return ResponseEntity.accepted().location(URI.create(JOB_PATH + job.id())).body(job.view());
    }

    /** Queues a solve; the work reads the job for its cancel flag and reports progress into it. */
    SolveJob submit(String kind, Function<SolveJob, Object> work) {
        long waiting = jobs.values().stream().filter(j -> !j.status().finished()).count();
        if (waiting >= MAX_WAITING) {
            throw new Busy();
        }
        SolveJob job = new SolveJob(UUID.randomUUID().toString(), kind, Instant.now(clock));
        jobs.put(job.id(), job);
        worker.execute(() -> run(job, work));
        prune();
        return job;
    }

    private void run(SolveJob job, Function<SolveJob, Object> work) {
        if (!job.start(Instant.now(clock))) {
            return; // cancelled while waiting
        }
        try {
            Object result = work.apply(job);
            job.succeed(result, Instant.now(clock));
        } catch (SolveCancelledException e) {
            job.markCancelled(Instant.now(clock));
        } catch (IllegalArgumentException e) {
            job.fail(e.getMessage(), Instant.now(clock));
        } catch (RuntimeException e) {
            log.error("solve {} failed", job.id(), e);
            job.fail("the solve failed unexpectedly", Instant.now(clock));
        }
    }

    Optional<SolveJob> find(String id) {
        return Optional.ofNullable(jobs.get(id));
    }

    /** Asks a job to stop; a waiting job is cancelled at once, a running one at its next evaluation. */
    Optional<SolveJob> cancel(String id) {
        SolveJob job = jobs.get(id);
        if (job != null) {
            job.requestCancel(Instant.now(clock));
        }
        return Optional.ofNullable(job);
    }

    private void prune() {
        List<SolveJob> finished = new ArrayList<>(jobs.values().stream().filter(j -> j.status().finished()).toList());
        if (finished.size() <= KEEP_FINISHED) {
            return;
        }
        finished.sort(Comparator.comparing(SolveJob::createdAt));
        for (int i = 0; i < finished.size() - KEEP_FINISHED; i++) {
            jobs.remove(finished.get(i).id());
        }
    }

    @PreDestroy
    void stop() {
        jobs.values().forEach(j -> j.requestCancel(Instant.now(clock)));
        worker.shutdownNow();
    }
}
