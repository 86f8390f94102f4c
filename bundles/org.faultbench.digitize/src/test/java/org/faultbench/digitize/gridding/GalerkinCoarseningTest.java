package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The coarse operator must be P^T A P exactly, checked against a dense product (definition of Galerkin coarsening). */
class GalerkinCoarseningTest {

    @Test
    void coarseOperatorIsTheTripleProduct() {
        CurvatureLevel level = FaultedPatch.equations(0.2);
        GridMatrix a = CurvatureSolver.matrix(level, CurvatureSolver.scales(level));
        Prolongation p = new Prolongation(LevelLinks.of(level));
        GridMatrix coarse = GalerkinCoarsening.coarse(a, p);

        double[][] fine = dense(a);
        int nf = a.size();
        int nc = coarse.size();
        double[][] prolongation = new double[nf][nc];
        int[] parents = new int[4];
        double[] weights = new double[4];
        for (int k = 0; k < nf; k++) {
            int count = p.parents(k, parents, weights);
            for (int m = 0; m < count; m++) {
                prolongation[k][parents[m]] = weights[m];
            }
        }
        double[][] expected = multiply(transpose(prolongation), multiply(fine, prolongation));
        double[][] actual = dense(coarse);
        double largest = 0;
        for (int r = 0; r < nc; r++) {
            for (int c = 0; c < nc; c++) {
                largest = Math.max(largest, Math.abs(expected[r][c]));
                if (coarse.unknown(r)) {
                    assertEquals(expected[r][c], actual[r][c], 1e-9, "entry (" + r + ", " + c + ")");
                }
            }
        }
        assertTrue(largest > 1, "the product is not trivially zero");
    }

    private static double[][] dense(GridMatrix a) {
        double[][] dense = new double[a.size()][a.size()];
        int[] columns = new int[GridMatrix.WINDOW];
        double[] weights = new double[GridMatrix.WINDOW];
        for (int k = 0; k < a.size(); k++) {
            int entries = a.row(k, columns, weights);
            for (int e = 0; e < entries; e++) {
                dense[k][columns[e]] += weights[e];
            }
        }
        return dense;
    }

    private static double[][] transpose(double[][] m) {
        double[][] t = new double[m[0].length][m.length];
        for (int r = 0; r < m.length; r++) {
            for (int c = 0; c < m[0].length; c++) {
                t[c][r] = m[r][c];
            }
        }
        return t;
    }

    private static double[][] multiply(double[][] x, double[][] y) {
        double[][] product = new double[x.length][y[0].length];
        for (int r = 0; r < x.length; r++) {
            for (int m = 0; m < y.length; m++) {
                if (x[r][m] != 0) {
                    for (int c = 0; c < y[0].length; c++) {
                        product[r][c] += x[r][m] * y[m][c];
                    }
                }
            }
        }
        return product;
    }
}
