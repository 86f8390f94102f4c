package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
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

    /**
     * A vector almost along the basis: one classical Gram&ndash;Schmidt pass would leave it orthogonal only to about
     * 1e-16 / 1e-9 of its length; the repeated pass must bring that back to rounding level (Daniel, Gragg, Kaufman &amp;
     * Stewart 1976, Math. Comp. 30, 772&ndash;795; from memory). Vectors span several parallel blocks.
     */
    @Test
    void orthogonalisesAVectorAlmostInTheBasisSpan() {
        int n = 3 * Parallel.BLOCK + 77;
        Random random = new Random(11);
        double[][] basis = new double[4][];
        for (int i = 0; i < 3; i++) {
            double[] v = randomVector(random, n);
            for (int m = 0; m < i; m++) {
                subtract(v, basis[m], dot(v, basis[m]));
            }
            scaleToUnit(v);
            basis[i] = v;
        }
        double[] w = new double[n];
        double[] noise = randomVector(random, n);
        for (int k = 0; k < n; k++) {
            w[k] = 2 * basis[0][k] - 3 * basis[2][k] + 1e-9 * noise[k];
        }
        double[][] h = new double[4][3];

        double norm = Gmres.orthogonalise(w, basis, 3, h, 1);

        assertEquals(Math.sqrt(dot(w, w)), norm, 1e-12 * norm);
        for (int i = 0; i < 3; i++) {
            assertTrue(Math.abs(dot(w, basis[i])) < 1e-13 * norm, "left along basis vector " + i + ": "
                    + dot(w, basis[i]) / norm);
        }
        assertEquals(2, h[0][1], 1e-8);
        assertEquals(0, h[1][1], 1e-8);
        assertEquals(-3, h[2][1], 1e-8);
        assertEquals(1e-9 * Math.sqrt(n / 3.0), norm, 0.05 * norm, "what is left is the noise, uniform on [-1, 1)");
    }

    private static double[] randomVector(Random random, int n) {
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            v[k] = 2 * random.nextDouble() - 1;
        }
        return v;
    }

    private static double dot(double[] x, double[] y) {
        double sum = 0;
        for (int k = 0; k < x.length; k++) {
            sum += x[k] * y[k];
        }
        return sum;
    }

    private static void subtract(double[] x, double[] v, double factor) {
        for (int k = 0; k < x.length; k++) {
            x[k] -= factor * v[k];
        }
    }

    private static void scaleToUnit(double[] v) {
        double norm = Math.sqrt(dot(v, v));
        for (int k = 0; k < v.length; k++) {
            v[k] /= norm;
        }
    }
}
