package org.faultbench.digitize.gridding;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;

/**
 * Which grid nodes carry a surface and which neighbouring nodes may be combined in a finite-difference stencil:
 * a node inside a fault polygon is inactive, and the link between two side-by-side nodes is closed when the
 * straight path between them is blocked by a fault ({@link FaultBarriers}). Exact path tests run once per link and
 * only near a fault.
 */
final class NodeLinks {
    private final GridGeometry g;
    private final boolean[] active;
    private final boolean[] openEast;
    private final boolean[] openNorth;

    NodeLinks(GridGeometry g, FaultBarriers barriers) {
        this.g = g;
        int n = g.size();
        active = new boolean[n];
        openEast = new boolean[n];
        openNorth = new boolean[n];
        boolean polygons = !barriers.polygons().isEmpty();
        for (int k = 0; k < n; k++) {
            active[k] = !polygons || !barriers.isInFaultPolygon(g.x(g.column(k)), g.y(g.row(k)));
        }
        GridMask near = barriers.nearNodes(g);
        for (int k = 0; k < n; k++) {
            int i = g.column(k);
            int j = g.row(k);
            openEast[k] = i + 1 < g.nx() && open(k, k + 1, near, barriers);
            openNorth[k] = j + 1 < g.ny() && open(k, k + g.nx(), near, barriers);
        }
    }

    private boolean open(int a, int b, GridMask near, FaultBarriers barriers) {
        if (!active[a] || !active[b]) {
            return false;
        }
        if (!near.contains(a) && !near.contains(b)) {
            return true;
        }
        return !barriers.blocks(g.x(g.column(a)), g.y(g.row(a)), g.x(g.column(b)), g.y(g.row(b)));
    }

    GridGeometry geometry() {
        return g;
    }

    boolean active(int k) {
        return active[k];
    }

    /** Link from node (i, j) to (i + 1, j); false outside the grid. */
    boolean east(int i, int j) {
        return i >= 0 && i + 1 < g.nx() && j >= 0 && j < g.ny() && openEast[j * g.nx() + i];
    }

    /** Link from node (i, j) to (i, j + 1); false outside the grid. */
    boolean north(int i, int j) {
        return i >= 0 && i < g.nx() && j >= 0 && j + 1 < g.ny() && openNorth[j * g.nx() + i];
    }

    /** Whether nodes (i - 1, j), (i, j), (i + 1, j) are linked, so that d2z/dx2 can be taken at (i, j). */
    boolean rowTriple(int i, int j) {
        return east(i - 1, j) && east(i, j);
    }

    /** Whether nodes (i, j - 1), (i, j), (i, j + 1) are linked, so that d2z/dy2 can be taken at (i, j). */
    boolean columnTriple(int i, int j) {
        return north(i, j - 1) && north(i, j);
    }

    /** Whether the four nodes of the cell with lower-left node (i, j) are linked, so that d2z/dxdy can be taken. */
    boolean cell(int i, int j) {
        return east(i, j) && north(i, j) && east(i, j + 1) && north(i + 1, j);
    }

    /** Nodes joined by open links to at least one of {@code seeds}: a fault block with data. */
    boolean[] reachableFrom(boolean[] seeds) {
        int n = g.size();
        boolean[] reached = new boolean[n];
        int[] stack = new int[n];
        int top = 0;
        for (int k = 0; k < n; k++) {
            if (seeds[k]) {
                reached[k] = true;
                stack[top++] = k;
            }
        }
        while (top > 0) {
            int k = stack[--top];
            int i = g.column(k);
            int j = g.row(k);
            top = visit(east(i, j), k + 1, reached, stack, top);
            top = visit(east(i - 1, j), k - 1, reached, stack, top);
            top = visit(north(i, j), k + g.nx(), reached, stack, top);
            top = visit(north(i, j - 1), k - g.nx(), reached, stack, top);
        }
        return reached;
    }

    private static int visit(boolean linked, int k, boolean[] reached, int[] stack, int top) {
        if (linked && !reached[k]) {
            reached[k] = true;
            stack[top++] = k;
            return top;
        }
        return top;
    }
}
