package org.faultbench.digitize.gridding;

/**
 * Restarted GMRES with right preconditioning (Saad &amp; Schultz 1986, SIAM J. Sci. Stat. Comput. 7, 856&ndash;869;
 * Saad 2003, Iterative Methods for Sparse Linear Systems, 2nd ed., algorithm 9.5; from memory).
 * <p>
 * Why GMRES: the data equations make the minimum-curvature system non-symmetric, which rules out conjugate
 * gradients. Why right preconditioning: the norm it minimises and tests is that of the true residual b &minus; A x,
 * not of a preconditioned one, so the stopping rule means what it says. The Krylov basis grows lazily up to
 * {@code restart} vectors of the grid's size.
 */
final class Gmres {
    /** A Gram-Schmidt pass is repeated when it leaves less than this fraction of the vector's norm. */
    private static final double REPEAT_BELOW = 0.01;

    /** A linear map out = L(in); {@code out} is overwritten. */
    interface LinearMap {
        void apply(double[] in, double[] out);
    }

    /**
     * How the solve ended.
     *
     * @param iterations Krylov iterations made (each one preconditioner application and one product with A)
     * @param residualNorm Euclidean norm of b &minus; A x at the end
     * @param converged whether that norm reached the tolerance
     */
    record Outcome(int iterations, double residualNorm, boolean converged) {
    }

    private Gmres() {
    }

    /**
     * Improves {@code x} (in place) until &Vert;b &minus; A x&Vert; &le; {@code tolerance} or {@code maxIterations}
     * iterations have been made.
     */
    static Outcome solve(LinearMap a, LinearMap preconditioner, double[] b, double[] x, double tolerance,
            int maxIterations, int restart) {
        int n = b.length;
        double[] r = new double[n];
        double[] w = new double[n];
        double[] z = new double[n];
        double[][] basis = new double[restart + 1][];
        double beta = residual(a, b, x, r);
        int total = 0;
        while (beta > tolerance && total < maxIterations) {
            basis[0] = vector(basis[0], n);
            scale(r, 1 / beta, basis[0]);
            double[][] h = new double[restart + 1][restart];
            double[] cs = new double[restart];
            double[] sn = new double[restart];
            double[] g = new double[restart + 1];
            g[0] = beta;
            int j = 0;
            while (j < restart && total < maxIterations) {
                preconditioner.apply(basis[j], z);
                a.apply(z, w);
                total++;
                h[j + 1][j] = orthogonalise(w, basis, j + 1, h, j);
                boolean breakdown = !(h[j + 1][j] > 0);
                if (!breakdown) {
                    basis[j + 1] = vector(basis[j + 1], n);
                    scale(w, 1 / h[j + 1][j], basis[j + 1]);
                }
                for (int i = 0; i < j; i++) {
                    double upper = cs[i] * h[i][j] + sn[i] * h[i + 1][j];
                    h[i + 1][j] = -sn[i] * h[i][j] + cs[i] * h[i + 1][j];
                    h[i][j] = upper;
                }
                double norm = Math.hypot(h[j][j], h[j + 1][j]);
                cs[j] = norm == 0 ? 1 : h[j][j] / norm;
                sn[j] = norm == 0 ? 0 : h[j + 1][j] / norm;
                h[j][j] = norm;
                h[j + 1][j] = 0;
                g[j + 1] = -sn[j] * g[j];
                g[j] = cs[j] * g[j];
                j++;
                if (Math.abs(g[j]) <= tolerance || breakdown) {
                    break;
                }
            }
            double[] y = backSubstitute(h, g, j);
            java.util.Arrays.fill(w, 0);
            for (int i = 0; i < j; i++) {
                axpy(y[i], basis[i], w);
            }
            preconditioner.apply(w, z);
            axpy(1, z, x);
            double previous = beta;
            beta = residual(a, b, x, r);
            if (!(beta < previous)) {
                break;
            }
        }
        return new Outcome(total, beta, beta <= tolerance);
    }

    /**
     * Removes from {@code w} its components along the first {@code count} basis vectors, adding them to column
     * {@code column} of {@code h}, and returns the norm of what is left.
     * <p>
     * Classical Gram&ndash;Schmidt: all projections taken in one sweep over the vectors and removed in a second.
     * Why not modified Gram&ndash;Schmidt: it reads the whole basis twice per vector, one vector at a time, and on a
     * million-node grid that memory traffic cost more than a third of the preconditioner. Classical Gram&ndash;Schmidt
     * loses orthogonality when a pass cancels most of the vector, so such a pass is repeated (Daniel, Gragg, Kaufman
     * &amp; Stewart 1976, Math. Comp. 30, 772&ndash;795: "twice is enough"; from memory). Measured on the benchmark
     * dome: a pass leaves 3 % to 30 % of the vector, so the repeat does not happen there. Whatever orthogonality is
     * lost, the solve stops on the true residual recomputed at each restart, never on the estimate alone.
     */
    static double orthogonalise(double[] w, double[][] basis, int count, double[][] h, int column) {
        double[] dots = Parallel.dots(w, basis, count);
        double before = Math.sqrt(dots[count]);
        double after = before;
        for (int pass = 0; pass < 2; pass++) {
            for (int i = 0; i < count; i++) {
                h[i][column] += dots[i];
            }
            after = Math.sqrt(Parallel.subtractCombination(w, basis, dots, count));
            if (after >= REPEAT_BELOW * before) {
                break;
            }
            dots = Parallel.dots(w, basis, count);
            before = after;
        }
        return after;
    }

    private static double[] vector(double[] existing, int n) {
        return existing != null ? existing : new double[n];
    }

    private static double residual(LinearMap a, double[] b, double[] x, double[] r) {
        a.apply(x, r);
        Parallel.forRange(r.length, (from, to) -> {
            for (int k = from; k < to; k++) {
                r[k] = b[k] - r[k];
            }
        });
        return Math.sqrt(Parallel.dot(r, r));
    }

    /** Solves the leading j x j upper triangle of h for y. */
    private static double[] backSubstitute(double[][] h, double[] g, int j) {
        double[] y = new double[j];
        for (int i = j - 1; i >= 0; i--) {
            double sum = g[i];
            for (int m = i + 1; m < j; m++) {
                sum -= h[i][m] * y[m];
            }
            y[i] = h[i][i] == 0 ? 0 : sum / h[i][i];
        }
        return y;
    }

    private static void scale(double[] from, double factor, double[] to) {
        Parallel.forRange(from.length, (lo, hi) -> {
            for (int k = lo; k < hi; k++) {
                to[k] = factor * from[k];
            }
        });
    }

    private static void axpy(double factor, double[] x, double[] y) {
        Parallel.forRange(x.length, (lo, hi) -> {
            for (int k = lo; k < hi; k++) {
                y[k] += factor * x[k];
            }
        });
    }
}
