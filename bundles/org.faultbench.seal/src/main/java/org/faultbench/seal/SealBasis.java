package org.faultbench.seal;

/** What controls the threshold pressure at a fault point. */
public enum SealBasis {
    /**
     * Juxtaposition alone: reservoir facing non-reservoir seals (threshold +infinity), reservoir facing reservoir
     * across a fault without fault rock (zero throw) leaks (threshold 0).
     */
    JUXTAPOSITION,
    /** Reservoir faces reservoir and the fault rock's capillary entry pressure holds the column. */
    FAULT_ROCK
}
