package org.faultbench.digitize.gridding;

import java.util.Arrays;

/**
 * Interpolation of a correction from the grid of every second node (coarse node (I, J) sits on fine node (2I, 2J))
 * to the fine grid, and its transpose, which hands fine residuals down.
 * <p>
 * A fine node takes its value from the corners of its coarse cell that it reaches through open links, so no
 * correction crosses a fault: bilinear weights when all parents are joined; when some are cut off, the average of
 * the remaining ones, preferring two opposite corners (a plane is then still reproduced); a single parent is
 * injected. A node that reaches no corner directly takes the first coarse node met by a walk of open links inside
 * its 3 &times; 3 neighbourhood, or no parent at all; the smoother alone then corrects it.
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
        for (int j = 0; j < fineNy; j++) {
            for (int i = 0; i < fineNx; i++) {
                if (fine.unknown(i, j)) {
                    assignParents(fine, i, j);
                }
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
        for (int m = 0; m < count; m++) {
            parent[base + m] = joined[m];
            weight[base + m] = 1.0 / count;
        }
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

    /** Parent slots of fine node k start at MAX_PARENTS * k; unused slots hold -1. */
    int[] parentTable() {
        return parent;
    }

    double[] weightTable() {
        return weight;
    }

    /** The weight of coarse node {@code c} in fine node {@code k}, 0 when it is not a parent. */
    double weight(int k, int c) {
        int base = MAX_PARENTS * k;
        for (int m = 0; m < MAX_PARENTS && parent[base + m] >= 0; m++) {
            if (parent[base + m] == c) {
                return weight[base + m];
            }
        }
        return 0;
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
