package org.faultbench.trap;

import org.faultbench.core.grid.GridMask;

/**
 * The deepest level a structure can fill to before hydrocarbons escape past a saddle or off the mapped area.
 *
 * @param source computed by flooding the depth grid, or entered by the user
 * @param depth spill depth, metres positive down; {@code +Infinity} when barriers close the structure on every side
 *        (barrier-limited: the column is then set by leak or top seal, see {@link TrapAnalysis})
 * @param x map x of the spill node, NaN when there is none (user-entered or barrier-limited)
 * @param y map y of the spill node, NaN when there is none
 * @param atDataEdge whether the spill node lies on the grid edge or next to a null node: the closure is then cut by
 *        the end of the mapped data rather than by a mapped saddle, which deserves a warning
 * @param trapped nodes connected to the crest and shallower than the spill depth
 */
public record SpillPoint(Source source, double depth, double x, double y, boolean atDataEdge, GridMask trapped) {

    /** Where a spill depth came from. */
    public enum Source {
        COMPUTED, USER
    }

    public SpillPoint {
        if (source == null || trapped == null) {
            throw new IllegalArgumentException("spill point source or trapped mask missing");
        }
        if (Double.isNaN(depth) || depth == Double.NEGATIVE_INFINITY) {
            throw new IllegalArgumentException("spill depth must be a number or +Infinity, was " + depth);
        }
    }

    /** Whether barriers close the structure so that it never spills. */
    public boolean isBarrierLimited() {
        return depth == Double.POSITIVE_INFINITY;
    }
}
