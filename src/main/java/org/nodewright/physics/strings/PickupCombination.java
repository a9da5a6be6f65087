package org.nodewright.physics.strings;

/** How two pickups' outputs are combined. */
public enum PickupCombination {
    /** In phase: g1 + g2. */
    SUM,
    /** Opposite phase: g1 − g2. */
    OPPOSITE
}
