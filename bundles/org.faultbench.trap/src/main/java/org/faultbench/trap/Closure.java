package org.faultbench.trap;

import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;

/**
 * The part of a structure filled by a hydrocarbon column whose free-water level lies at a given depth: the nodes
 * shallower than that level that connect to the crest without passing deeper nodes, blocked nodes or null nodes.
 * A separate culmination that would only join at a deeper level stays out, as its fill is a separate question.
 */
public final class Closure {

    private Closure() {
    }

    /**
     * @param top top-reservoir depth grid, metres positive down
     * @param blocked nodes the column cannot enter (barriers, or everything outside a compartment)
     * @param crest start node
     * @param level free-water level or contact depth, metres; nodes at exactly this depth are not filled
     * @param connectivity neighbour rule
     */
    public static GridMask connectedAbove(RegularGrid top, GridMask blocked, Crest crest, double level,
            Connectivity connectivity) {
        FloodChecks.requireFloodable(top, blocked, "blocked-node mask", "a blocked node", crest);
        if (Double.isNaN(level) || connectivity == null) {
            throw new IllegalArgumentException("closure level must be a number, was " + level
                    + ", and the connectivity must be given");
        }
        boolean[] filled = new boolean[top.geometry().size()];
        int start = top.geometry().index(crest.i(), crest.j());
        if (top.value(start) < level) {
            fill(top, blocked, start, level, connectivity, filled);
        }
        return GridMask.of(top.geometry(), filled);
    }

    private static void fill(RegularGrid top, GridMask blocked, int start, double level, Connectivity connectivity,
            boolean[] filled) {
        int nx = top.nx();
        IntList stack = new IntList();
        filled[start] = true;
        stack.add(start);
        while (!stack.isEmpty()) {
            int k = stack.removeLast();
            int i = k % nx;
            int j = k / nx;
            for (int n = 0; n < connectivity.neighbourCount(); n++) {
                int ni = i + connectivity.di(n);
                int nj = j + connectivity.dj(n);
                if (!top.geometry().contains(ni, nj)) {
                    continue;
                }
                int nk = nj * nx + ni;
                if (!filled[nk] && !blocked.contains(nk) && top.value(nk) < level) {
                    filled[nk] = true;
                    stack.add(nk);
                }
            }
        }
    }
}
