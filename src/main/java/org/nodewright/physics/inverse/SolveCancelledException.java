package org.nodewright.physics.inverse;

/** Thrown inside a solve when its caller asked it to stop. */
public final class SolveCancelledException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public SolveCancelledException() {
        super("the solve was cancelled");
    }
}
