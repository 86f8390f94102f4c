package org.faultbench.trap;

/** What sets the free-water level of a trap. */
public enum Mechanism {
    /** The structure fills to its spill point. */
    SPILL,
    /** A bounding fault leaks first (juxtaposition window or fault-rock threshold exceeded). */
    LEAK,
    /** The top seal's capillary threshold is exceeded first. */
    TOP_SEAL
}
