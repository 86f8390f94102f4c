package org.faultbench.trap;

import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;

/** Finds the crest: the shallowest non-null node of a compartment of the top-reservoir depth grid. */
public final class CrestFinder {

    private CrestFinder() {
    }

    /**
     * @param top top-reservoir depth grid, metres positive down
     * @param compartment nodes that belong to the compartment
     * @return the shallowest node; on a tie the first in row-major order
     */
    public static Crest find(RegularGrid top, GridMask compartment) {
        if (top == null || compartment == null) {
            throw new IllegalArgumentException("depth grid or compartment mask missing");
        }
        top.geometry().requireSame(compartment.geometry(), "compartment mask");
        int best = -1;
        for (int k = 0; k < top.geometry().size(); k++) {
            if (compartment.contains(k) && !top.isNull(k) && (best < 0 || top.value(k) < top.value(best))) {
                best = k;
            }
        }
        if (best < 0) {
            throw new IllegalArgumentException("the compartment has no depth value: all its "
                    + compartment.count() + " nodes are null");
        }
        int i = top.geometry().column(best);
        int j = top.geometry().row(best);
        return new Crest(i, j, top.x(i), top.y(j), top.value(best));
    }
}
