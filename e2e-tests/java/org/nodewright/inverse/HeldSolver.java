package org.nodewright.inverse;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.springframework.context.ApplicationContext;

/**
 * Browser-test aid: keeps the app's single solve worker busy until closed, so that the next solve
 * a page starts waits in the queue (the same hold the controller test uses, reached from a
 * browser test through the application context).
 */
public final class HeldSolver implements AutoCloseable {

    private final CountDownLatch release = new CountDownLatch(1);
    private final SolveJob blocker;

    private HeldSolver(SolveJobs jobs) {
        blocker = jobs.submit("test-hold", j -> {
            try {
                release.await(120, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return "released";
        });
    }

    /** Holds the worker of the running app and returns once the hold is running on it. */
    public static HeldSolver hold(ApplicationContext app) throws InterruptedException {
        HeldSolver held = new HeldSolver(app.getBean(SolveJobs.class));
        for (int i = 0; i < 200 && held.blocker.status() != SolveJob.Status.RUNNING; i++) {
            Thread.sleep(50);
        }
        if (held.blocker.status() != SolveJob.Status.RUNNING) {
            held.close();
            throw new IllegalStateException("the solve worker did not take the hold: " + held.blocker.status());
        }
        return held;
    }

    /** Whether the hold itself is still running (a cancel meant for another job left it alone). */
    public boolean stillHolding() {
        return blocker.status() == SolveJob.Status.RUNNING;
    }

    @Override
    public void close() {
        release.countDown();
    }
}
