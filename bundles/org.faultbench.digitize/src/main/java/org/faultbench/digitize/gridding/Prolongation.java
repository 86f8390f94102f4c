package org.faultbench.digitize.gridding;

import java.util.Arrays;

/**
 * Interpolation of a correction from the grid of every second node (coarse node (I, J) sits on fine node (2I, 2J))
 * to the fine grid, and its transpose, which hands fine residuals down.
 * <p>
 * A fine node takes its value from the corners of its coarse cell that it reaches through open links, so no
 * correction crosses a fault: bilinear weights when all parents are joined; when some are cut off, two opposite
 * corners are averaged, and otherwise the reachable corners are extrapolated linearly from their coarse neighbours on
 * the node's own side ({@link #extrapolate}), so that a plane is reproduced beside faults and along the last row and
 * column of an even grid too. A node that reaches no corner directly takes the first coarse node met by a walk of
 * open links inside its 3 &times; 3 neighbourhood, or no parent at all; the smoother alone then corrects it.
 * Extrapolated parents lie up to three fine nodes away; {@link GalerkinCoarsening} walks the transposed table.
 */
final class Prolongation {
    /** Parent slots per fine node. */
    static final int MAX_PARENTS = 4;

    private final int fineNx;
    private final int coarseNx;
    private final int coarseNy;
    private final boolean[] coarseUnknown;
    private final int[] parent;
    private final double[] weight;
    /** Transpose of the parent table: the fine nodes interpolated from coarse node c are child[childStart[c]...]. */
    private final int[] childStart;
    private final int[] child;
    private final double[] childWeight;

    Prolongation(LevelLinks fine) {
        fineNx = fine.nx();
        int fineNy = fine.ny();
        coarseNx = (fineNx + 1) / 2;
        coarseNy = (fineNy + 1) / 2;
        coarseUnknown = new boolean[coarseNx * coarseNy];
        for (int cj = 0; cj < coarseNy; cj++) {
            for (int ci = 0; ci < coarseNx; ci++) {
                coarseUnknown[cj * coarseNx + ci] = fine.unknown(2 * ci, 2 * cj);
            }
        }
        parent = new int[MAX_PARENTS * fineNx * fineNy];
        weight = new double[parent.length];
        Arrays.fill(parent, -1);
        // each node writes only its own parent slots, so rows can be filled side by side
        Parallel.forEach(fineNy, j -> {
            for (int i = 0; i < fineNx; i++) {
                if (fine.unknown(i, j)) {
                    assignParents(fine, i, j);
                }
            }
        });
        childStart = new int[coarseNx * coarseNy + 1];
        for (int p : parent) {
            if (p >= 0) {
                childStart[p + 1]++;
            }
        }
        for (int c = 0; c < coarseNx * coarseNy; c++) {
            childStart[c + 1] += childStart[c];
        }
        child = new int[childStart[childStart.length - 1]];
        childWeight = new double[child.length];
        int[] next = Arrays.copyOf(childStart, childStart.length - 1);
        for (int slot = 0; slot < parent.length; slot++) {
            if (parent[slot] >= 0) {
                int at = next[parent[slot]]++;
                child[at] = slot / MAX_PARENTS;
                childWeight[at] = weight[slot];
            }
        }
    }

    private void assignParents(LevelLinks fine, int i, int j) {
        int[] joined = new int[MAX_PARENTS];
        int count = 0;
        for (int cj = j / 2; cj <= (j + 1) / 2; cj++) {
            for (int ci = i / 2; ci <= (i + 1) / 2; ci++) {
                if (ci < coarseNx && cj < coarseNy && fine.joined(i, j, 2 * ci - i, 2 * cj - j)) {
                    joined[count++] = cj * coarseNx + ci;
                }
            }
        }
        if (count == 3) {
            count = keepOppositePair(joined);
        }
        int base = MAX_PARENTS * (j * fineNx + i);
        if (count == 0) {
            int nearest = firstCoarseNodeWalkedTo(fine, i, j);
            if (nearest >= 0) {
                parent[base] = nearest;
                weight[base] = 1;
            }
            return;
        }
        if (count < expectedCount(i, j) && extrapolate(fine, i, j, joined, count, base)) {
            return;
        }
        for (int m = 0; m < count; m++) {
            parent[base + m] = joined[m];
            weight[base + m] = 1.0 / count;
        }
    }

    private static int expectedCount(int i, int j) {
        return (1 + i % 2) * (1 + j % 2);
    }

    /**
     * Parents for a fine node that some of its corners cannot reach (a fault or the grid edge between them), chosen
     * so that a plane is still interpolated exactly: the reachable corners are extended by their coarse neighbours on
     * the far side from the node, and the value is extrapolated linearly, half a coarse cell. Why: copying the nearest
     * corner (what remains without this) is exact only for a constant; along every fault and the last row and column
     * of an even grid it then hands the fine grid a correction with a kink, and the fourth-order equations turn such
     * kinks into residuals that the sweeps remove only slowly. Measured: a two-grid cycle (exact coarse solve, 3 + 3
     * sweeps, 206 scattered points, no fault) reduced the residual by 0.54 per cycle on a 64 &times; 64 grid instead
     * of 0.81 (0.48 on 63 &times; 63, whose edges are coarse nodes); the gridding benchmark needs 13 Krylov
     * iterations instead of 28. False when the far-side neighbours are not joined.
     */
    private boolean extrapolate(LevelLinks fine, int i, int j, int[] joined, int count, int base) {
        if (count == 1) {
            int c = joined[0];
            int ci = c % coarseNx;
            int cj = c / coarseNx;
            int di = Integer.signum(i - 2 * ci);
            int dj = Integer.signum(j - 2 * cj);
            int awayX = di != 0 && coarseJoined(fine, ci, cj, -di, 0) ? c - di : -1;
            int awayY = dj != 0 && coarseJoined(fine, ci, cj, 0, -dj) ? c - dj * coarseNx : -1;
            if (awayX < 0 && awayY < 0) {
                return false;
            }
            double own = 1;
            int m = 1;
            for (int away : new int[] { awayX, awayY }) {
                if (away >= 0) {
                    own += 0.5;
                    parent[base + m] = away;
                    weight[base + m++] = -0.5;
                }
            }
            parent[base] = c;
            weight[base] = own;
            return true;
        }
        // two corners of one cell side; the node lies half a cell off that side
        int a = joined[0];
        int b = joined[1];
        boolean sameRow = a / coarseNx == b / coarseNx;
        boolean sameColumn = a % coarseNx == b % coarseNx;
        if (sameRow == sameColumn) {
            return false;
        }
        int ai = a % coarseNx;
        int aj = a / coarseNx;
        int bi = b % coarseNx;
        int bj = b / coarseNx;
        int di = sameColumn ? Integer.signum(i - 2 * ai) : 0;
        int dj = sameRow ? Integer.signum(j - 2 * aj) : 0;
        if (!coarseJoined(fine, ai, aj, -di, -dj) || !coarseJoined(fine, bi, bj, -di, -dj)) {
            return false;
        }
        int shift = -di - dj * coarseNx;
        int[] parents = { a, b, a + shift, b + shift };
        double[] weights = { 0.75, 0.75, -0.25, -0.25 };
        for (int m = 0; m < MAX_PARENTS; m++) {
            parent[base + m] = parents[m];
            weight[base + m] = weights[m];
        }
        return true;
    }

    /**
     * Whether coarse node (ci, cj) and its neighbour (ci + di, cj + dj) (one step along an axis) both carry a value
     * and the two fine links between them are open, as {@link LevelLinks#coarsened} joins them.
     */
    private boolean coarseJoined(LevelLinks fine, int ci, int cj, int di, int dj) {
        int ni = ci + di;
        int nj = cj + dj;
        if (ni < 0 || nj < 0 || ni >= coarseNx || nj >= coarseNy || !coarseUnknown[nj * coarseNx + ni]
                || !coarseUnknown[cj * coarseNx + ci]) {
            return false;
        }
        return di != 0 ? fine.coarseEastOpen(Math.min(ci, ni), cj) : fine.coarseNorthOpen(ci, Math.min(cj, nj));
    }

    /** Of three corners of a cell, keeps the two that are opposite each other (listed in row order) and says 2. */
    private int keepOppositePair(int[] corners) {
        int a = corners[0];
        int b = corners[1];
        int c = corners[2];
        boolean abOpposite = a % coarseNx != b % coarseNx && a / coarseNx != b / coarseNx;
        if (abOpposite) {
            return 2;
        }
        boolean acOpposite = a % coarseNx != c % coarseNx && a / coarseNx != c / coarseNx;
        corners[acOpposite ? 1 : 0] = c;
        return 2;
    }

    /** Breadth-first walk over open links inside the 3 x 3 nodes round (i, j); the first coarse node met, or -1. */
    private int firstCoarseNodeWalkedTo(LevelLinks fine, int i, int j) {
        int[] queue = new int[9];
        boolean[] seen = new boolean[9];
        int head = 0;
        int tail = 0;
        queue[tail++] = 4;
        seen[4] = true;
        int[][] steps = { { 1, 0 }, { -1, 0 }, { 0, 1 }, { 0, -1 } };
        while (head < tail) {
            int cell = queue[head++];
            int ui = i + cell % 3 - 1;
            int uj = j + cell / 3 - 1;
            if (ui % 2 == 0 && uj % 2 == 0 && cell != 4) {
                return (uj / 2) * coarseNx + ui / 2;
            }
            for (int[] s : steps) {
                int ni = cell % 3 + s[0];
                int nj = cell / 3 + s[1];
                if (ni >= 0 && ni < 3 && nj >= 0 && nj < 3 && !seen[nj * 3 + ni]
                        && fine.joined(ui, uj, s[0], s[1])) {
                    seen[nj * 3 + ni] = true;
                    queue[tail++] = nj * 3 + ni;
                }
            }
        }
        return -1;
    }

    int coarseNx() {
        return coarseNx;
    }

    int coarseNy() {
        return coarseNy;
    }

    /** Which coarse nodes sit on a fine node that carries a value. */
    boolean[] coarseUnknown() {
        return coarseUnknown.clone();
    }

    /**
     * Writes the parents of fine node {@code k} (coarse indices) and their weights.
     *
     * @return the number of parents, 0 to {@value #MAX_PARENTS}
     */
    int parents(int k, int[] indices, double[] weights) {
        int base = MAX_PARENTS * k;
        int count = 0;
        while (count < MAX_PARENTS && parent[base + count] >= 0) {
            indices[count] = parent[base + count];
            weights[count] = weight[base + count];
            count++;
        }
        return count;
    }

    /** The fine nodes that take a share of coarse node {@code c}, in grid order, as indices into {@link #child}. */
    int firstChild(int c) {
        return childStart[c];
    }

    int endOfChildren(int c) {
        return childStart[c + 1];
    }

    int child(int slot) {
        return child[slot];
    }

    double childWeight(int slot) {
        return childWeight[slot];
    }

    /** Parent slots of fine node k start at MAX_PARENTS * k; unused slots hold -1. */
    int[] parentTable() {
        return parent;
    }

    double[] weightTable() {
        return weight;
    }

    /** fine += P coarse on the fine nodes {@code from} (inclusive) to {@code to} (exclusive). */
    void interpolateAdd(double[] coarse, double[] fine, int from, int to) {
        for (int k = from; k < to; k++) {
            int base = MAX_PARENTS * k;
            double sum = 0;
            for (int m = 0; m < MAX_PARENTS && parent[base + m] >= 0; m++) {
                sum += weight[base + m] * coarse[parent[base + m]];
            }
            fine[k] += sum;
        }
    }

    /** coarse = P<sup>T</sup> fine: each fine residual shared among its parents by their weights. */
    void restrict(double[] fine, double[] coarse) {
        Arrays.fill(coarse, 0);
        for (int k = 0; k < fine.length; k++) {
            int base = MAX_PARENTS * k;
            for (int m = 0; m < MAX_PARENTS && parent[base + m] >= 0; m++) {
                coarse[parent[base + m]] += weight[base + m] * fine[k];
            }
        }
    }
}
