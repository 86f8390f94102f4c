package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

/** Restarted GMRES on a small non-symmetric system, checked against commons-math3's LU solution. */
class GmresTest {

    @Test
    void solvesANonSymmetricSystemWithRestarts() {
        int n = 40;
        Random random = new Random(5);
        double[][] a = new double[n][n];
        double[] b = new double[n];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                a[r][c] = (r == c ? 4 : 0) + (Math.abs(r - c) <= 2 ? random.nextDouble() - 0.3 : 0);
            }
            b[r] = random.nextDouble() * 100;
        }
        double[] expected = new LUDecomposition(new Array2DRowRealMatrix(a)).getSolver()
                .solve(new ArrayRealVector(b)).toArray();
        double[] x = new double[n];
        // Jacobi preconditioner, restart after 5 iterations so that restarts are exercised
        Gmres.Outcome outcome = Gmres.solve((in, out) -> {
            for (int r = 0; r < n; r++) {
                double sum = 0;
                for (int c = 0; c < n; c++) {
                    sum += a[r][c] * in[c];
                }
                out[r] = sum;
            }
        }, (in, out) -> {
            for (int r = 0; r < n; r++) {
                out[r] = in[r] / a[r][r];
            }
        }, b, x, 1e-10, 500, 5);
        assertTrue(outcome.converged(), outcome.toString());
        assertTrue(outcome.iterations() > 5, "restarted at least once: " + outcome.iterations());
        assertArrayEquals(expected, x, 1e-9);
    }
}
