package org.faultbench.sim;

/**
 * Where a unit's leak point sits: fault, distance along strike and depth of the fault-plane point whose supported
 * free-water level is the shallowest.
 */
public record LeakLocation(String faultId, double u, double z) {
}
