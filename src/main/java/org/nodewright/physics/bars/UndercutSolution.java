package org.nodewright.physics.bars;

/**
 * A tuned undercut.
 *
 * @param bar         the bar as cut (its section carries the profile)
 * @param shape       the undercut's parameters
 * @param frequencies the bending modes reached, Hz (modes 1..targets)
 * @param cents       each target's error in cents (positive = sharp)
 * @param evaluations bar analyses the solve used
 * @param converged   true when every target is within the tolerance
 */
public record UndercutSolution(Bar bar, UndercutShape shape, double[] frequencies, double[] cents, int evaluations,
        boolean converged) {

    public double worstCents() {
        double w = 0;
        for (double c : cents) {
            w = Math.max(w, Math.abs(c));
        }
        return w;
    }
}
