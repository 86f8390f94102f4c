package org.faultbench.faults;

import org.locationtech.jts.geom.Coordinate;

/**
 * The fault as a planar surface in fault-plane coordinates (u, z): u along the trace, z depth. The trace is the fault's
 * line at the reference depth {@code traceDepth}; deeper points move horizontally towards the hanging wall by
 * (z − traceDepth) / tan(dip), perpendicular to the trace (a constant-dip surface, common practice for fault-plane
 * sections; listric or warped faults need a gridded surface instead).
 */
public final class FaultSurface {
    private final Fault fault;
    private final double traceDepth;

    public FaultSurface(Fault fault, double traceDepth) {
        if (fault == null || !Double.isFinite(traceDepth)) {
            throw new IllegalArgumentException("fault surface needs a fault and a finite trace depth, was " + traceDepth);
        }
        this.fault = fault;
        this.traceDepth = traceDepth;
    }

    public Fault fault() {
        return fault;
    }

    /** Horizontal distance from the trace to the surface at depth z, towards the hanging wall (negative above). */
    public double heaveOffset(double z) {
        return fault.isVertical() ? 0 : (z - traceDepth) / Math.tan(Math.toRadians(fault.dipDegrees()));
    }

    /** Map position and depth (x, y, z) of fault-plane point (u, z). */
    public Coordinate point(double u, double z) {
        double offset = heaveOffset(z);
        Coordinate c = offset >= 0 ? fault.positionAt(u, Wall.HANGING_WALL, offset)
                : fault.positionAt(u, Wall.FOOTWALL, -offset);
        return new Coordinate(c.x, c.y, z);
    }
}
