package org.faultbench.seal;

import org.faultbench.core.column.ResolvedColumn;

/**
 * Everything a seal criterion needs to know about one point on a fault.
 *
 * <p>Geometry, in stratigraphic coordinates of the footwall column (metres, positive down from the top of its first
 * unit): the footwall rock at the point sits at position s; the hanging-wall rock at the point sits at s - T of the
 * hanging-wall stratigraphy, taken equal to the footwall column (same thickness on both walls, no growth). The rocks
 * that have slipped past the point are those of the footwall column in the throw window [s - T, s]; with equal
 * thickness on both walls this is the construction of Yielding, Freeman &amp; Needham (1997). Distances along the
 * fault are measured vertically, in the same units as throw and thickness (fault dip ignored). Rock above or below
 * the column is treated as non-reservoir.
 *
 * @param depth depth z of the point, m, positive down (TVDSS)
 * @param faultThrow throw T at the point, m, &ge; 0
 * @param footwallPosition stratigraphic position s of the footwall rock at the point
 * @param footwallColumn the footwall column
 * @param burialDepth burial depth used for calibration (state whether present-day or maximum), m, &ge; 0
 */
public record FaultPointContext(double depth, double faultThrow, double footwallPosition,
        ResolvedColumn footwallColumn, double burialDepth) {

    public FaultPointContext {
        if (!Double.isFinite(depth)) {
            throw new IllegalArgumentException("fault point: depth must be a finite number, was " + depth);
        }
        if (!(faultThrow >= 0) || Double.isInfinite(faultThrow)) {
            throw new IllegalArgumentException("fault point: throw must be a finite number >= 0 m, was " + faultThrow);
        }
        if (!Double.isFinite(footwallPosition)) {
            throw new IllegalArgumentException("fault point: footwall stratigraphic position must be a finite number, "
                    + "was " + footwallPosition);
        }
        if (footwallColumn == null) {
            throw new IllegalArgumentException("fault point: footwall column is missing");
        }
        if (!(burialDepth >= 0) || Double.isInfinite(burialDepth)) {
            throw new IllegalArgumentException("fault point: burial depth must be a finite number >= 0 m, was "
                    + burialDepth);
        }
    }

    /** Stratigraphic position s - T of the hanging-wall rock at the point. */
    public double hangingWallPosition() {
        return footwallPosition - faultThrow;
    }

    /** Whether a reservoir unit faces a reservoir unit across the point (always false outside the column). */
    public boolean reservoirAgainstReservoir() {
        return isReservoir(footwallPosition) && isReservoir(hangingWallPosition());
    }

    private boolean isReservoir(double position) {
        int index = footwallColumn.unitAt(position);
        return index >= 0 && index < footwallColumn.size() && footwallColumn.unit(index).reservoir();
    }
}
