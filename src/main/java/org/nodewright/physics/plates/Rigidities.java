package org.nodewright.physics.plates;

/**
 * Flexural rigidities of a thin orthotropic plate in its principal axes (x along the grain), N·m.
 * Bending energy density ½[D11 w_xx² + 2 D12 w_xx w_yy + D22 w_yy² + 4 D66 w_xy²] (Lekhnitskii; Leissa 1969, ch. 11).
 */
public record Rigidities(double d11, double d12, double d22, double d66) {

    /** The same plate scaled by a factor (rigidities go with thickness cubed). */
    Rigidities times(double factor) {
        return new Rigidities(d11 * factor, d12 * factor, d22 * factor, d66 * factor);
    }
}
