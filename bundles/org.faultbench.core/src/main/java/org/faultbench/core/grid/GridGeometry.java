package org.faultbench.core.grid;

/**
 * Where the nodes of a regular map grid lie, shared by depth grids and masks so that they can be checked to match.
 * <p>
 * Node (i, j) sits at (x0 + i&middot;dx, y0 + j&middot;dy) and stands for the dx by dy cell centred on it (node = cell
 * centre), so the grid covers [x0 &minus; dx/2, x0 + (nx &minus; 1/2)&middot;dx] by
 * [y0 &minus; dy/2, y0 + (ny &minus; 1/2)&middot;dy] and every node carries the area dx&middot;dy in volume sums.
 * Nodes are numbered row-major: index = j&middot;nx + i, with i along x (fastest) and j along y.
 *
 * @param nx number of nodes along x, &ge; 2
 * @param ny number of nodes along y, &ge; 2
 * @param x0 map x of node (0, 0), metres
 * @param y0 map y of node (0, 0), metres
 * @param dx node spacing along x, metres, &gt; 0
 * @param dy node spacing along y, metres, &gt; 0
 */
public record GridGeometry(int nx, int ny, double x0, double y0, double dx, double dy) {

    public GridGeometry {
        if (nx < 2 || ny < 2) {
            throw new IllegalArgumentException(
                    "a grid needs at least 2 nodes in each direction, was nx = " + nx + ", ny = " + ny);
        }
        if ((long) nx * ny > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("grid of " + nx + " x " + ny + " nodes is too large");
        }
        requireFinite("x0", x0);
        requireFinite("y0", y0);
        requireSpacing("dx", dx);
        requireSpacing("dy", dy);
    }

    private static void requireFinite(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("grid origin " + field + " must be a finite number, was " + value);
        }
    }

    private static void requireSpacing(String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("grid spacing " + field + " must be a finite number > 0, was " + value);
        }
    }

    /** Number of nodes. */
    public int size() {
        return nx * ny;
    }

    /** Row-major index of node (i, j). */
    public int index(int i, int j) {
        if (!contains(i, j)) {
            throw new IndexOutOfBoundsException("node (" + i + ", " + j + ") is outside a " + nx + " x " + ny + " grid");
        }
        return j * nx + i;
    }

    /** Whether (i, j) is a node of this grid. */
    public boolean contains(int i, int j) {
        return i >= 0 && i < nx && j >= 0 && j < ny;
    }

    /** Column i of the node with row-major index {@code index}. */
    public int column(int index) {
        return index % nx;
    }

    /** Row j of the node with row-major index {@code index}. */
    public int row(int index) {
        return index / nx;
    }

    /** Map x of column i. */
    public double x(int i) {
        return x0 + i * dx;
    }

    /** Map y of row j. */
    public double y(int j) {
        return y0 + j * dy;
    }

    /** Area each node stands for, dx&middot;dy, square metres. */
    public double cellArea() {
        return dx * dy;
    }

    /** Throws with a message naming {@code what} when {@code other} does not lie on the same nodes. */
    public void requireSame(GridGeometry other, String what) {
        if (!equals(other)) {
            throw new IllegalArgumentException(what + " lies on other nodes: expected " + this + ", was " + other);
        }
    }
}
