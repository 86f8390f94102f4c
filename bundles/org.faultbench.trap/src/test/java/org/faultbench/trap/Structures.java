package org.faultbench.trap;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;

/** Analytic top-reservoir surfaces whose spill points are known by hand. */
final class Structures {
    /** 61 x 61 nodes, 50 m apart, node (30, 30) at the origin. */
    static final GridGeometry SADDLE_GEOMETRY = new GridGeometry(61, 61, -1500, -1500, 50, 50);

    private Structures() {
    }

    /**
     * A cone z = 1000 + 0.08 r around the origin, cut off to the east by a ramp rising up-dip to the grid edge,
     * z = 1080 + 0.08 (1000 - x) + 1e-5 y^2. Every node at x = 1000 is at least 1080 m deep (the cone is, r &ge; 1000,
     * and so is the ramp), with 1080 only at y = 0, and the north, south and west edges are deeper than 1100 m on
     * the cone side: the crest at 1000 m spills at 1080 m at (1000, 0) towards the east edge (hand calculation).
     */
    static RegularGrid saddle() {
        return RegularGrid.sample(SADDLE_GEOMETRY, (x, y) -> Math.min(1000 + 0.08 * Math.hypot(x, y),
                1080 + 0.08 * (1000 - x) + 1e-5 * y * y));
    }

    /** Crest of {@link #saddle()}: node (30, 30) at the origin, 1000 m. */
    static Crest saddleCrest() {
        return new Crest(30, 30, 0, 0, 1000);
    }
}
