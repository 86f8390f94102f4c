package org.faultbench.trap;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;

/**
 * Finds the spill point of a structure on a top-reservoir depth grid by priority-flood (Barnes, Lehman &amp; Mulla
 * 2014, "Priority-flood: an optimal depression-filling and watershed-labeling algorithm for digital elevation
 * models", Computers &amp; Geosciences 62), run from the crest.
 * <p>
 * With depth positive down a structural high is a depression of the depth surface, so filling it with hydrocarbon
 * is filling a depression. The flood takes nodes in order of their fill level, the deepest depth met on the best
 * path from the crest (the minimax path). The spill depth is the fill level of the first node that touches the
 * outside: the grid edge or a null node. Barrier nodes (sealing fault traces) are never entered. If the flood runs
 * out of nodes without touching the outside, the structure is barrier-limited and the spill depth is +Infinity.
 * The spill point is the node where that path is deepest, i.e. the saddle. A saddle into a neighbouring closed
 * high is not a spill point by this rule: given enough charge both fill to one common level, their joint spill
 * point. Cost O(N log N) for the N nodes flooded, with no object per node.
 */
public final class SpillPointFinder {
    private final Connectivity connectivity;

    /** A finder that steps between nodes sharing a cell side. */
    public SpillPointFinder() {
        this(Connectivity.FOUR);
    }

    public SpillPointFinder(Connectivity connectivity) {
        if (connectivity == null) {
            throw new IllegalArgumentException("connectivity missing");
        }
        this.connectivity = connectivity;
    }

    /**
     * @param top top-reservoir depth grid, metres positive down; null nodes count as outside the structure
     * @param barriers nodes no hydrocarbon may cross (sealing faults)
     * @param crest start of the flood, normally from {@link CrestFinder}
     */
    public SpillPoint find(RegularGrid top, GridMask barriers, Crest crest) {
        FloodChecks.requireFloodable(top, barriers, "barrier mask", "a barrier node", crest);
        return new Flood(top, barriers).run(top.geometry().index(crest.i(), crest.j()));
    }

    /**
     * A spill depth entered by the user, with the trapped nodes those of the user's compartment that connect to the
     * crest above that depth.
     */
    public SpillPoint userDefined(RegularGrid top, GridMask compartment, Crest crest, double spillDepth) {
        if (compartment == null) {
            throw new IllegalArgumentException("compartment mask missing");
        }
        GridMask outside = compartment.not();
        FloodChecks.requireFloodable(top, outside, "compartment mask", "outside the compartment", crest);
        if (!Double.isFinite(spillDepth) || spillDepth < crest.z()) {
            throw new IllegalArgumentException("user spill depth must be a finite number at or below the crest ("
                    + crest.z() + " m), was " + spillDepth);
        }
        GridMask trapped = Closure.connectedAbove(top, outside, crest, spillDepth, connectivity);
        return new SpillPoint(SpillPoint.Source.USER, spillDepth, Double.NaN, Double.NaN, false, trapped);
    }

    /** State of one flood. */
    private final class Flood {
        private final RegularGrid top;
        private final GridMask barriers;
        private final GridGeometry g;
        private final boolean[] reached;
        private final boolean[] trapped;
        /** Nodes taken at the current fill level: they are not below the spill depth if it is this level. */
        private final IntList sameLevel = new IntList();

        Flood(RegularGrid top, GridMask barriers) {
            this.top = top;
            this.barriers = barriers;
            this.g = top.geometry();
            this.reached = new boolean[g.size()];
            this.trapped = new boolean[g.size()];
        }

        SpillPoint run(int crest) {
            FloodQueue queue = new FloodQueue(256);
            queue.push(top.value(crest), crest, crest);
            reached[crest] = true;
            double currentLevel = Double.NEGATIVE_INFINITY;
            while (!queue.isEmpty()) {
                double level = queue.peekLevel();
                int node = queue.peekNode();
                int saddle = queue.peekSaddle();
                queue.pop();
                if (level > currentLevel) {
                    sameLevel.clear();
                    currentLevel = level;
                }
                if (touchesOutside(node)) {
                    return spillAt(level, saddle);
                }
                trapped[node] = true;
                sameLevel.add(node);
                enqueueNeighbours(queue, node, level, saddle);
            }
            return new SpillPoint(SpillPoint.Source.COMPUTED, Double.POSITIVE_INFINITY, Double.NaN, Double.NaN, false,
                    GridMask.of(g, trapped));
        }

        private void enqueueNeighbours(FloodQueue queue, int node, double level, int saddle) {
            int i = g.column(node);
            int j = g.row(node);
            for (int n = 0; n < connectivity.neighbourCount(); n++) {
                int ni = i + connectivity.di(n);
                int nj = j + connectivity.dj(n);
                if (!g.contains(ni, nj)) {
                    continue;
                }
                int next = nj * g.nx() + ni;
                if (reached[next] || top.isNull(next) || barriers.contains(next)) {
                    continue;
                }
                reached[next] = true;
                double z = top.value(next);
                if (z > level) {
                    queue.push(z, next, next);
                } else {
                    queue.push(level, next, saddle);
                }
            }
        }

        /** On the grid edge, or next to a null node. */
        private boolean touchesOutside(int node) {
            int i = g.column(node);
            int j = g.row(node);
            for (int n = 0; n < connectivity.neighbourCount(); n++) {
                int ni = i + connectivity.di(n);
                int nj = j + connectivity.dj(n);
                if (!g.contains(ni, nj) || top.isNull(nj * g.nx() + ni)) {
                    return true;
                }
            }
            return false;
        }

        private SpillPoint spillAt(double level, int saddle) {
            for (int k = 0; k < sameLevel.size(); k++) {
                trapped[sameLevel.get(k)] = false;
            }
            int i = g.column(saddle);
            int j = g.row(saddle);
            return new SpillPoint(SpillPoint.Source.COMPUTED, level, g.x(i), g.y(j), touchesOutside(saddle),
                    GridMask.of(g, trapped));
        }
    }
}
