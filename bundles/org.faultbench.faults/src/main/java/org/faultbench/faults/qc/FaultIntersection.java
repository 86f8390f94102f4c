package org.faultbench.faults.qc;

import org.locationtech.jts.geom.Coordinate;

/**
 * Where another fault's trace meets a fault's trace.
 *
 * @param otherFaultId id of the other fault
 * @param u along-strike distance on the fault (m)
 * @param point map position
 */
public record FaultIntersection(String otherFaultId, double u, Coordinate point) {
}
