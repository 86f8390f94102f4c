package org.faultbench.juxtaposition;

/**
 * A point on the unrolled fault plane.
 *
 * @param u along-strike distance (m)
 * @param z depth (m, positive down)
 * @param column index of the fault-plane column it lies in
 */
public record FaultPlanePoint(double u, double z, int column) {
}
