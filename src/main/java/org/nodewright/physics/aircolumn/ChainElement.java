package org.nodewright.physics.aircolumn;

/**
 * One link of the {@link ElementChain}: a piece of duct or a side hole, placed at {@link #start()}
 * metres from the input end. Each carries the state (pressure, volume flow) one step upstream.
 */
sealed interface ChainElement permits Duct, SideHole {

    /** Position of the element's upstream end (a hole's centre), m. */
    double start();

    /**
     * Length whose lossless phase e^{-jk l} the caller supplies to {@link #propagate}: the duct's
     * length, or twice a hole's chimney length.
     */
    double rotationLength();

    /**
     * Carries the state from the element's downstream side to its upstream side.
     *
     * @param w  the frequency's terms
     * @param er real part of e^{-jk l}, l = {@link #rotationLength()}
     * @param ei imaginary part of e^{-jk l}
     * @param s  the state, replaced in place
     */
    void propagate(DuctKernel.Frequency w, double er, double ei, DuctKernel.State s);
}
