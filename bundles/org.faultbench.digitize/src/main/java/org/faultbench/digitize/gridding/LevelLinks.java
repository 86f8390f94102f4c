package org.faultbench.digitize.gridding;

/**
 * Which nodes of one multigrid level carry a value and which side-by-side nodes are joined, so that a coarse-grid
 * correction is never interpolated across a fault. The finest level takes the fault barriers from {@link NodeLinks};
 * a coarser level (every second node) joins two neighbours when both fine links between them are open.
 */
final class LevelLinks {
    private final int nx;
    private final int ny;
    private final boolean[] unknown;
    private final boolean[] openEast;
    private final boolean[] openNorth;

    private LevelLinks(int nx, int ny, boolean[] unknown, boolean[] openEast, boolean[] openNorth) {
        this.nx = nx;
        this.ny = ny;
        this.unknown = unknown;
        this.openEast = openEast;
        this.openNorth = openNorth;
    }

    /** The links of the equations' own grid, kept only between nodes that both carry a value. */
    static LevelLinks of(CurvatureLevel level) {
        NodeLinks links = level.links();
        int nx = level.geometry().nx();
        int ny = level.geometry().ny();
        boolean[] unknown = new boolean[nx * ny];
        for (int k = 0; k < unknown.length; k++) {
            unknown[k] = level.isUnknown(k);
        }
        boolean[] east = new boolean[unknown.length];
        boolean[] north = new boolean[unknown.length];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                east[k] = links.east(i, j) && unknown[k] && unknown[k + 1];
                north[k] = links.north(i, j) && unknown[k] && unknown[k + nx];
            }
        }
        return new LevelLinks(nx, ny, unknown, east, north);
    }

    /** Nodes and links on the grid of every second node, given which coarse nodes keep an equation. */
    LevelLinks coarsened(int coarseNx, int coarseNy, boolean[] coarseUnknown) {
        boolean[] east = new boolean[coarseNx * coarseNy];
        boolean[] north = new boolean[east.length];
        for (int j = 0; j < coarseNy; j++) {
            for (int i = 0; i < coarseNx; i++) {
                int k = j * coarseNx + i;
                east[k] = i + 1 < coarseNx && coarseUnknown[k] && coarseUnknown[k + 1] && coarseEastOpen(i, j);
                north[k] = j + 1 < coarseNy && coarseUnknown[k] && coarseUnknown[k + coarseNx]
                        && coarseNorthOpen(i, j);
            }
        }
        return new LevelLinks(coarseNx, coarseNy, coarseUnknown, east, north);
    }

    /** Whether both links from node (2ci, 2cj) to (2ci + 2, 2cj) are open: what joins coarse node (ci, cj) eastward. */
    boolean coarseEastOpen(int ci, int cj) {
        return east(2 * ci, 2 * cj) && east(2 * ci + 1, 2 * cj);
    }

    /** Whether both links from node (2ci, 2cj) to (2ci, 2cj + 2) are open: what joins coarse node (ci, cj) north. */
    boolean coarseNorthOpen(int ci, int cj) {
        return north(2 * ci, 2 * cj) && north(2 * ci, 2 * cj + 1);
    }

    int nx() {
        return nx;
    }

    int ny() {
        return ny;
    }

    boolean unknown(int i, int j) {
        return i >= 0 && i < nx && j >= 0 && j < ny && unknown[j * nx + i];
    }

    /** Link from node (i, j) to (i + 1, j); false outside the grid. */
    boolean east(int i, int j) {
        return i >= 0 && i + 1 < nx && j >= 0 && j < ny && openEast[j * nx + i];
    }

    /** Link from node (i, j) to (i, j + 1); false outside the grid. */
    boolean north(int i, int j) {
        return i >= 0 && i < nx && j >= 0 && j + 1 < ny && openNorth[j * nx + i];
    }

    /** Whether (i, j) and (i + di, j + dj), |di|, |dj| &le; 1, are joined by a path of at most two open links. */
    boolean joined(int i, int j, int di, int dj) {
        if (di == 0 && dj == 0) {
            return unknown(i, j);
        }
        if (dj == 0) {
            return di > 0 ? east(i, j) : east(i - 1, j);
        }
        if (di == 0) {
            return dj > 0 ? north(i, j) : north(i, j - 1);
        }
        return joined(i, j, di, 0) && joined(i + di, j, 0, dj) || joined(i, j, 0, dj) && joined(i, j + dj, di, 0);
    }
}
