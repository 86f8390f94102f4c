package org.faultbench.digitize.gridding;

import java.util.stream.IntStream;

/**
 * The coarse-grid operator A<sub>c</sub> = P<sup>T</sup> A P of a multigrid level (Galerkin coarsening; Trottenberg,
 * Oosterlee &amp; Sch&uuml;ller 2001, Multigrid, section 2.3.2 and chapter 7; from memory).
 * <p>
 * Why Galerkin and not the equations rediscretised on the coarse grid: the coarse operator then is exactly the fine
 * one seen through the interpolation, so fault barriers, edges and data equations act on the coarse correction as
 * they act on the fine surface, and no coarse grid pins the correction at data nodes of its own. With P interpolating
 * from at most one node away and A reaching two nodes, A<sub>c</sub> again reaches two coarse nodes, so every level
 * keeps the 5 &times; 5 window of {@link GridMatrix}. Beside a fault, P extrapolates from up to three nodes away
 * ({@link Prolongation}); where a fault tip or a narrow sliver between faults then makes a product reach a third
 * coarse node, that weight is added to the nearest slot of the window instead. The row still sums as the product
 * does (a constant is mapped as before), and the cycle stays one fixed linear map, which is all that GMRES asks of a
 * preconditioner; the coarse operator differs from P<sup>T</sup> A P only in those rows.
 */
final class GalerkinCoarsening {
    private static final int ROWS_PER_TASK = 4096;

    private GalerkinCoarsening() {
    }

    static GridMatrix coarse(GridMatrix fine, Prolongation p) {
        int cnx = p.coarseNx();
        int cny = p.coarseNy();
        int n = cnx * cny;
        boolean[] unknown = p.coarseUnknown();
        boolean[] standard = standardRows(fine, cnx, cny);
        double[] windows = new double[n * GridMatrix.WINDOW];
        int tasks = (n + ROWS_PER_TASK - 1) / ROWS_PER_TASK;
        IntStream.range(0, tasks).parallel().forEach(t -> {
            Scratch scratch = new Scratch();
            for (int c = t * ROWS_PER_TASK; c < Math.min(n, (t + 1) * ROWS_PER_TASK); c++) {
                if (unknown[c] && !standard[c]) {
                    coarseRow(fine, p, c, windows, scratch);
                }
            }
        });
        int first = firstStandard(standard, unknown);
        boolean anyStandard = first >= 0;
        double[] sharedWindow = null;
        if (anyStandard) {
            coarseRow(fine, p, first, windows, new Scratch());
            sharedWindow = java.util.Arrays.copyOfRange(windows, first * GridMatrix.WINDOW,
                    (first + 1) * GridMatrix.WINDOW);
        }
        return new GridMatrix(cnx, cny, unknown, anyStandard ? standard : null, sharedWindow,
                (k, window) -> System.arraycopy(windows, k * GridMatrix.WINDOW, window, 0, GridMatrix.WINDOW));
    }

    private static int firstStandard(boolean[] standard, boolean[] unknown) {
        for (int c = 0; c < standard.length; c++) {
            if (standard[c] && unknown[c]) {
                return c;
            }
        }
        return -1;
    }

    /**
     * Coarse nodes whose fine node has only shared-stencil rows within three nodes: their Galerkin row is the same
     * everywhere (all interpolation there is plain bilinear, as no link nearby is closed), so it is computed once.
     */
    private static boolean[] standardRows(GridMatrix fine, int cnx, int cny) {
        int fnx = fine.nx();
        int fny = fine.ny();
        int[] sum = new int[(fnx + 1) * (fny + 1)];
        for (int j = 0; j < fny; j++) {
            for (int i = 0; i < fnx; i++) {
                int inside = fine.shared(j * fnx + i) ? 1 : 0;
                sum[(j + 1) * (fnx + 1) + i + 1] = inside + sum[j * (fnx + 1) + i + 1] + sum[(j + 1) * (fnx + 1) + i]
                        - sum[j * (fnx + 1) + i];
            }
        }
        boolean[] standard = new boolean[cnx * cny];
        for (int cj = 0; cj < cny; cj++) {
            for (int ci = 0; ci < cnx; ci++) {
                int i0 = 2 * ci - 3;
                int j0 = 2 * cj - 3;
                int i1 = 2 * ci + 4;
                int j1 = 2 * cj + 4;
                if (i0 >= 0 && j0 >= 0 && i1 <= fnx && j1 <= fny) {
                    int count = sum[j1 * (fnx + 1) + i1] - sum[j0 * (fnx + 1) + i1] - sum[j1 * (fnx + 1) + i0]
                            + sum[j0 * (fnx + 1) + i0];
                    standard[cj * cnx + ci] = count == 49;
                }
            }
        }
        return standard;
    }

    /** Buffers for one row. */
    private static final class Scratch {
        final int[] columns = new int[GridMatrix.WINDOW];
        final double[] entries = new double[GridMatrix.WINDOW];
    }

    /** Row c of P^T A P: sum over fine nodes f interpolated from c of P(f, c) times row f of A P. */
    private static void coarseRow(GridMatrix fine, Prolongation p, int c, double[] windows, Scratch s) {
        int cnx = p.coarseNx();
        int ci = c % cnx;
        int cj = c / cnx;
        int base = c * GridMatrix.WINDOW;
        int[] parent = p.parentTable();
        double[] weight = p.weightTable();
        for (int slot = p.firstChild(c); slot < p.endOfChildren(c); slot++) {
            int f = p.child(slot);
            double pf = p.childWeight(slot);
            int entries = fine.row(f, s.columns, s.entries);
            for (int e = 0; e < entries; e++) {
                int col = s.columns[e];
                double a = pf * s.entries[e];
                int first = Prolongation.MAX_PARENTS * col;
                for (int m = first; m < first + Prolongation.MAX_PARENTS && parent[m] >= 0; m++) {
                    int si = Math.max(0, Math.min(4, parent[m] % cnx - ci + 2));
                    int sj = Math.max(0, Math.min(4, parent[m] / cnx - cj + 2));
                    windows[base + sj * GridMatrix.SPAN + si] += a * weight[m];
                }
            }
        }
    }
}
