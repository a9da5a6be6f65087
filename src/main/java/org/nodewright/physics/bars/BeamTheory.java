package org.nodewright.physics.bars;

/** Which beam theory the bending families use. */
public enum BeamTheory {
    /** Euler–Bernoulli: plane sections stay normal to the axis; no shear strain, no rotary inertia. */
    EULER_BERNOULLI,
    /** Timoshenko (1921): shear deformation and rotary inertia of the section included. */
    TIMOSHENKO
}
