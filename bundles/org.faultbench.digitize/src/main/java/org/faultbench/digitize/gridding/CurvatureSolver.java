package org.faultbench.digitize.gridding;

/**
 * Solves the minimum-curvature equations of one grid ({@link CurvatureLevel}, unchanged) by GMRES
 * ({@link Gmres}) preconditioned with a Galerkin multigrid V-cycle ({@link MultigridCycle}).
 * <p>
 * Why not the over-relaxation sweeps alone: they need thousands of sweeps on a 1000 &times; 1000 grid, because
 * long-wavelength error, above all along fault traces and edges far from data, decays by a tiny fraction per sweep.
 * The V-cycle removes it at every wavelength, and GMRES mops up the few modes (fault blocks, edges) that the
 * cycle treats poorly. The cycle works on the equations multiplied back by their normal-equation weights
 * ({@link CurvatureLevel#equationScale}), whose curvature rows are symmetric: with the rows as the sweeps see them
 * (unit centre weight) the Galerkin coarse operators had rows on which Gauss&ndash;Seidel diverged.
 * <p>
 * Stopping rule: each equation is scaled to a unit weight on its own node, so its residual is the change in metres
 * that one Jacobi sweep would make there; the caller bounds the root mean square of these residuals. The equations
 * are ill-conditioned where data are sparse (grid edges, fault blocks with few points): a small residual can hide a
 * larger error there, so the finest grid uses a bound far below the tolerance ({@link MinimumCurvatureGridder}).
 * Measured: on the test patch of CurvatureSolverTest, an RMS residual of 1e-7 m agrees with over-relaxation run to
 * 1e-11 m per sweep within 0.1 mm; on the benchmark dome at 250 &times; 250 nodes, an RMS residual of 1e-6 m left
 * up to 6 cm near an edge, and over-relaxation stopped at 0.1 mm per sweep up to 4 m.
 */
final class CurvatureSolver {
    private static final int RESTART = 30;

    private CurvatureSolver() {
    }

    /**
     * @param start one value per node, NaN allowed where the node is null
     * @param rmsTolerance the solve stops when the root mean square of the equation residuals is at most this, metres
     * @param maxIterations cap on Krylov iterations
     */
    static CurvatureLevel.Solution solve(CurvatureLevel level, double[] start, double rmsTolerance,
            int maxIterations) {
        double[] scale = scales(level);
        GridMatrix scaled = matrix(level, scale);
        int n = scaled.size();
        double[] b = new double[n];
        double[] x = new double[n];
        for (int k = 0; k < n; k++) {
            if (scaled.unknown(k)) {
                b[k] = level.rightHandSide(k);
                x[k] = Double.isNaN(start[k]) ? 0 : start[k];
            }
        }
        MultigridCycle cycle = new MultigridCycle(scaled, LevelLinks.of(level));
        double[] scaledResidual = new double[n];
        Gmres.LinearMap equations = (in, out) -> Parallel.forRange(n, (from, to) -> {
            scaled.multiply(in, out, from, to);
            for (int k = from; k < to; k++) {
                out[k] /= scale[k];
            }
        });
        Gmres.LinearMap preconditioner = (in, out) -> {
            Parallel.forRange(n, (from, to) -> {
                for (int k = from; k < to; k++) {
                    scaledResidual[k] = scale[k] * in[k];
                }
            });
            cycle.apply(scaledResidual, out);
        };
        double normTolerance = rmsTolerance * Math.sqrt(Math.max(1, scaled.unknownCount()));
        Gmres.Outcome outcome = Gmres.solve(equations, preconditioner, b, x, normTolerance, maxIterations, RESTART);
        for (int k = 0; k < n; k++) {
            if (!scaled.unknown(k)) {
                x[k] = Double.NaN;
            }
        }
        return new CurvatureLevel.Solution(x, outcome.iterations(), outcome.converged());
    }

    /** {@link CurvatureLevel#equationScale} of every node; 1 where the node is null. */
    static double[] scales(CurvatureLevel level) {
        double[] scale = new double[level.geometry().size()];
        for (int k = 0; k < scale.length; k++) {
            scale[k] = level.isUnknown(k) ? level.equationScale(k) : 1;
        }
        return scale;
    }

    /**
     * The equations of {@code level}, each multiplied by {@code scale}, as a sparse matrix, regular rows sharing one
     * stencil. With the scales of {@link #scales} the curvature rows are symmetric, which keeps Gauss&ndash;Seidel
     * stable on the Galerkin coarse grids.
     */
    static GridMatrix matrix(CurvatureLevel level, double[] scale) {
        int n = level.geometry().size();
        boolean[] unknown = new boolean[n];
        boolean[] regular = new boolean[n];
        double[] sharedWindow = null;
        for (int k = 0; k < n; k++) {
            unknown[k] = level.isUnknown(k);
            regular[k] = level.isRegular(k);
            if (regular[k] && sharedWindow == null) {
                sharedWindow = new double[GridMatrix.WINDOW];
                level.window(k, sharedWindow);
                for (int s = 0; s < sharedWindow.length; s++) {
                    sharedWindow[s] *= scale[k];
                }
            }
        }
        return new GridMatrix(level.geometry().nx(), level.geometry().ny(), unknown, regular, sharedWindow,
                (k, window) -> {
                    level.window(k, window);
                    for (int s = 0; s < window.length; s++) {
                        window[s] *= scale[k];
                    }
                });
    }
}
