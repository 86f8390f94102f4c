package org.faultbench.digitize.gridding;

/**
 * Controls of the minimum-curvature solution.
 *
 * @param tension 0 for pure minimum curvature (Briggs 1974); towards 1 the surface behaves like a stretched
 *        membrane and overshoots less between sparse data (Smith &amp; Wessel 1990, Geophysics 55, 293&ndash;305;
 *        from memory); in [0, 1)
 * @param tolerance metres, &gt; 0: the solve of the finest grid stops when the root mean square of the equation
 *        residuals (each the change in metres that one Jacobi sweep would make at its node) is at most 1/1000 of this,
 *        coarser grids at this times their spacing multiple ({@link MinimumCurvatureGridder})
 * @param maxIterations cap on Krylov iterations (one multigrid cycle each) per grid level, &ge; 1
 * @param overRelaxation factor of the successive over-relaxation sweeps, in (0, 2); 1.4 is customary (common
 *        practice). The gridder now solves by preconditioned GMRES and does not use it; it is kept so that existing
 *        settings stay valid
 */
public record MinimumCurvatureSettings(double tension, double tolerance, int maxIterations, double overRelaxation) {
    /** No tension, 0.1 mm tolerance, at most 5000 iterations per level, over-relaxation 1.4. */
    public static final MinimumCurvatureSettings DEFAULT = new MinimumCurvatureSettings(0, 1e-4, 5000, 1.4);

    public MinimumCurvatureSettings {
        if (!(tension >= 0 && tension < 1)) {
            throw new IllegalArgumentException("tension must be in [0, 1), was " + tension);
        }
        if (!(tolerance > 0) || Double.isInfinite(tolerance)) {
            throw new IllegalArgumentException("convergence tolerance must be a finite number > 0 m, was " + tolerance);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("iteration cap must be at least 1, was " + maxIterations);
        }
        if (!(overRelaxation > 0 && overRelaxation < 2)) {
            throw new IllegalArgumentException("over-relaxation factor must be in (0, 2), was " + overRelaxation);
        }
    }
}
