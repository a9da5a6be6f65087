package org.nodewright.physics.inverse;

/** Told after every evaluation of all fingerings: how far the solve is and how close. */
@FunctionalInterface
public interface SolveProgress {

    /**
     * @param evaluations   model evaluations so far (each evaluates every fingering once)
     * @param maxEvaluations the solver's cap
     * @param worstCents     largest |cents| error of the best layout seen so far
     */
    void update(int evaluations, int maxEvaluations, double worstCents);

    SolveProgress NONE = (e, m, w) -> { };
}
