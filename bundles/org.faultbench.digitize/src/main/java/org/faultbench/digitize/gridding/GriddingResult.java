package org.faultbench.digitize.gridding;

import org.faultbench.core.grid.RegularGrid;

/**
 * A gridded horizon with its misfit at the digitised data and how the solver ended.
 *
 * @param surface depth grid, metres; null nodes (NaN) where no value could be computed without crossing a fault
 * @param residuals misfit at every control point and contour vertex ({@link GriddingInput#digitizedPoints()})
 * @param iterations iterations on the finest grid for iterative methods (minimum curvature: Krylov iterations, one
 *        multigrid cycle each); 0 for direct ones (TIN)
 * @param converged whether the iteration met its tolerance before its cap; always true for direct methods
 */
public record GriddingResult(RegularGrid surface, ResidualReport residuals, int iterations, boolean converged) {

    public GriddingResult {
        if (surface == null || residuals == null) {
            throw new IllegalArgumentException("gridding result needs a surface and a residual report");
        }
        if (iterations < 0) {
            throw new IllegalArgumentException("iteration count must be >= 0, was " + iterations);
        }
    }
}
