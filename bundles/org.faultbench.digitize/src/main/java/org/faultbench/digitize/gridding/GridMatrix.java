package org.faultbench.digitize.gridding;

import java.util.Arrays;

/**
 * A sparse linear system on the nodes of a regular grid whose equations reach at most two nodes in each direction
 * (a 5 &times; 5 window): the minimum-curvature equations of one grid and their Galerkin coarse versions
 * ({@link GalerkinCoarsening}).
 * <p>
 * Why a class of our own: the multigrid smoother needs Gauss&ndash;Seidel sweeps in grid order and the coarsening
 * needs each row as grid offsets, neither of which a general sparse matrix offers. Rows that are the fixed 13-point
 * stencil share one set of weights, so the million rows of a fine grid store only the rows near faults, edges and
 * data. Null nodes carry no equation: their entries of every vector this class writes stay 0.
 */
final class GridMatrix {
    static final int SPAN = 5;
    static final int WINDOW = SPAN * SPAN;
    static final int CENTRE = WINDOW / 2;
    /** Rows per strip of the parallel Gauss-Seidel sweep; at least 2, the reach of an equation. */
    private static final int STRIP_ROWS = 16;

    private static final byte NONE = 0;
    private static final byte SHARED = 1;
    private static final byte STORED = 2;

    /** The weights of one row on its 5 x 5 window (slot (dj + 2) * 5 + di + 2); all slots are overwritten. */
    interface Rows {
        void window(int k, double[] window);
    }

    private final int nx;
    private final int ny;
    private final byte[] kind;
    private final int[] sharedOffsets;
    private final double[] sharedWeights;
    /** Weights of a shared symmetric 13-point stencil (along x at 1 and 2, along y at 1 and 2, diagonal), or null. */
    private final double[] thirteenPoint;
    private final int[] start;
    private final int[] column;
    private final double[] value;
    private final double[] diagonal;
    /** 1 / diagonal, so that a sweep multiplies instead of dividing on its critical path. */
    private final double[] inverseDiagonal;

    /**
     * @param unknown which nodes carry an equation
     * @param shared which of them obey {@code sharedWindow} (centre weight 1); null when none do
     * @param rows the window of every other unknown node; a row whose centre weight is not positive is dropped
     *        (the node then stays 0, as a null node)
     */
    GridMatrix(int nx, int ny, boolean[] unknown, boolean[] shared, double[] sharedWindow, Rows rows) {
        this.nx = nx;
        this.ny = ny;
        int n = nx * ny;
        kind = new byte[n];
        diagonal = new double[n];
        start = new int[n + 1];
        sharedOffsets = offDiagonalOffsets(sharedWindow, nx);
        sharedWeights = offDiagonalWeights(sharedWindow);
        thirteenPoint = thirteenPointWeights(sharedWindow);
        int[] columns = new int[Math.max(16, n)];
        double[] values = new double[columns.length];
        double[] window = new double[WINDOW];
        int count = 0;
        for (int k = 0; k < n; k++) {
            start[k] = count;
            if (!unknown[k]) {
                continue;
            }
            if (shared != null && shared[k]) {
                kind[k] = SHARED;
                diagonal[k] = sharedWindow[CENTRE];
                continue;
            }
            rows.window(k, window);
            if (!(window[CENTRE] > 0)) {
                continue;
            }
            kind[k] = STORED;
            diagonal[k] = window[CENTRE];
            if (count + WINDOW > columns.length) {
                columns = Arrays.copyOf(columns, 2 * columns.length);
                values = Arrays.copyOf(values, columns.length);
            }
            for (int s = 0; s < WINDOW; s++) {
                if (s != CENTRE && window[s] != 0) {
                    columns[count] = k + offset(s, nx);
                    values[count] = window[s];
                    count++;
                }
            }
        }
        start[n] = count;
        inverseDiagonal = new double[n];
        for (int k = 0; k < n; k++) {
            inverseDiagonal[k] = kind[k] == NONE ? 0 : 1 / diagonal[k];
        }
        column = Arrays.copyOf(columns, count);
        value = Arrays.copyOf(values, count);
    }

    private static int offset(int slot, int nx) {
        return (slot / SPAN - 2) * nx + slot % SPAN - 2;
    }

    private static int[] offDiagonalOffsets(double[] window, int nx) {
        if (window == null) {
            return new int[0];
        }
        return java.util.stream.IntStream.range(0, WINDOW).filter(s -> s != CENTRE && window[s] != 0)
                .map(s -> offset(s, nx)).toArray();
    }

    /** The five weights of {@code window} when it is a symmetric 13-point stencil, so that it can be unrolled. */
    private static double[] thirteenPointWeights(double[] window) {
        if (window == null) {
            return null;
        }
        double[] w = { window[slot(1, 0)], window[slot(2, 0)], window[slot(0, 1)], window[slot(0, 2)],
            window[slot(1, 1)] };
        double[] expected = new double[WINDOW];
        for (int d = -2; d <= 2; d += 4) {
            expected[slot(d, 0)] = w[1];
            expected[slot(0, d)] = w[3];
        }
        for (int d = -1; d <= 1; d += 2) {
            expected[slot(d, 0)] = w[0];
            expected[slot(0, d)] = w[2];
            expected[slot(d, -1)] = w[4];
            expected[slot(d, 1)] = w[4];
        }
        expected[CENTRE] = window[CENTRE];
        return Arrays.equals(expected, window) ? w : null;
    }

    private static int slot(int di, int dj) {
        return (dj + 2) * SPAN + di + 2;
    }

    private static double[] offDiagonalWeights(double[] window) {
        if (window == null) {
            return new double[0];
        }
        return java.util.stream.IntStream.range(0, WINDOW).filter(s -> s != CENTRE && window[s] != 0)
                .mapToDouble(s -> window[s]).toArray();
    }

    int nx() {
        return nx;
    }

    int ny() {
        return ny;
    }

    int size() {
        return kind.length;
    }

    /** Whether node {@code k} carries an equation. */
    boolean unknown(int k) {
        return kind[k] != NONE;
    }

    /** Whether node {@code k} uses the shared stencil. */
    boolean shared(int k) {
        return kind[k] == SHARED;
    }

    /** Number of nodes that carry an equation. */
    int unknownCount() {
        int count = 0;
        for (byte b : kind) {
            count += b == NONE ? 0 : 1;
        }
        return count;
    }

    /**
     * Writes the entries of row {@code k}, diagonal first, as node indices and weights into {@code columns} and
     * {@code weights} (at least {@value #WINDOW} long).
     *
     * @return the number of entries, 0 for a node without equation
     */
    int row(int k, int[] columns, double[] weights) {
        if (kind[k] == NONE) {
            return 0;
        }
        columns[0] = k;
        weights[0] = diagonal[k];
        int m = 1;
        if (kind[k] == SHARED) {
            for (int e = 0; e < sharedOffsets.length; e++) {
                columns[m] = k + sharedOffsets[e];
                weights[m++] = sharedWeights[e];
            }
        } else {
            for (int e = start[k]; e < start[k + 1]; e++) {
                columns[m] = column[e];
                weights[m++] = value[e];
            }
        }
        return m;
    }

    /** The off-diagonal part of row {@code k} times {@code x}. */
    private double offDiagonalProduct(int k, double[] x) {
        double sum = 0;
        if (kind[k] == SHARED && thirteenPoint != null) {
            double[] w = thirteenPoint;
            int up = k + nx;
            int down = k - nx;
            // the west neighbour last: in a forward sweep it was written just before, so the other terms can be
            // summed while it is still being computed
            sum = w[0] * x[k + 1] + w[1] * (x[k - 2] + x[k + 2]) + w[2] * (x[down] + x[up])
                    + w[3] * (x[down - nx] + x[up + nx]) + w[4] * (x[down - 1] + x[down + 1] + x[up - 1] + x[up + 1])
                    + w[0] * x[k - 1];
        } else if (kind[k] == SHARED) {
            for (int e = 0; e < sharedOffsets.length; e++) {
                sum += sharedWeights[e] * x[k + sharedOffsets[e]];
            }
        } else {
            for (int e = start[k]; e < start[k + 1]; e++) {
                sum += value[e] * x[column[e]];
            }
        }
        return sum;
    }

    /** r = b &minus; A x on the nodes {@code from} (inclusive) to {@code to} (exclusive); 0 where no equation. */
    void residual(double[] x, double[] b, double[] r, int from, int to) {
        for (int k = from; k < to; k++) {
            r[k] = kind[k] == NONE ? 0 : b[k] - diagonal[k] * x[k] - offDiagonalProduct(k, x);
        }
    }

    /** y = A x on the nodes {@code from} (inclusive) to {@code to} (exclusive); 0 where no equation. */
    void multiply(double[] x, double[] y, int from, int to) {
        for (int k = from; k < to; k++) {
            y[k] = kind[k] == NONE ? 0 : diagonal[k] * x[k] + offDiagonalProduct(k, x);
        }
    }

    /**
     * One Gauss&ndash;Seidel sweep on A x = b. The grid is cut into strips of {@value #STRIP_ROWS} rows; the even
     * strips are swept first, side by side in parallel, then the odd ones. Equations reach two rows, so strips of one
     * kind never read a node another strip of that kind writes: the result does not depend on the thread count.
     * {@code forward} sweeps each strip in grid order and the even strips first; otherwise everything runs in
     * reverse, so that a forward and a backward sweep together are symmetric.
     */
    void gaussSeidel(double[] x, double[] b, boolean forward) {
        int strips = (ny + STRIP_ROWS - 1) / STRIP_ROWS;
        for (int phase = 0; phase < 2; phase++) {
            int parity = forward ? phase : 1 - phase;
            int count = (strips - parity + 1) / 2;
            Parallel.forEach(count, m -> {
                int strip = 2 * m + parity;
                int from = strip * STRIP_ROWS * nx;
                int to = Math.min(ny, (strip + 1) * STRIP_ROWS) * nx;
                if (forward) {
                    for (int k = from; k < to; k++) {
                        relax(x, b, k);
                    }
                } else {
                    for (int k = to - 1; k >= from; k--) {
                        relax(x, b, k);
                    }
                }
            });
        }
    }

    private void relax(double[] x, double[] b, int k) {
        if (kind[k] != NONE) {
            x[k] = (b[k] - offDiagonalProduct(k, x)) * inverseDiagonal[k];
        }
    }
}
