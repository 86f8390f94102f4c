package org.faultbench.digitize.gridding;

import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.XyzPoint;

/**
 * Grids a horizon as the smoothest surface through the data: minimum curvature (Briggs 1974, Geophysics 39,
 * 39&ndash;48), optionally with tension (Smith &amp; Wessel 1990; from memory), with faults as barriers that no
 * finite-difference stencil reaches across ({@link CurvatureLevel}).
 * <p>
 * Contours enter as data points sampled every half node spacing along them. The equations of each grid are solved
 * by GMRES preconditioned with a Galerkin multigrid V-cycle ({@link CurvatureSolver}). The surface is first solved on
 * grids with 2, 4, 8... times the node spacing (coarsest about {@value #COARSEST_INTERVALS} cells across) and each
 * solution, read without crossing faults ({@link SurfaceSampler}), starts the next finer one: a close start saves
 * iterations on the large grids. A coarse level only has to give a start, so it stops when the root mean square of
 * its equation residuals is at most the tolerance times its spacing multiple; the finest grid stops at
 * {@value #FINE_RMS_FRACTION} of the tolerance, or at the iteration cap.
 * <p>
 * Null nodes: inside fault polygons, in fault blocks that hold no data, and isolated nodes (all four links closed).
 * A fault block with fewer than three data points not on a line has no unique minimum-curvature surface; the solve
 * then starts from the coarser level's tilt and keeps whichever solution it reaches from there.
 */
public final class MinimumCurvatureGridder implements SurfaceGridder {
    private static final int COARSEST_INTERVALS = 8;
    /** RMS equation residual on the finest grid at which the solve stops, as a fraction of the tolerance. */
    static final double FINE_RMS_FRACTION = 0.001;

    private final MinimumCurvatureSettings settings;

    /** A gridder with {@link MinimumCurvatureSettings#DEFAULT}. */
    public MinimumCurvatureGridder() {
        this(MinimumCurvatureSettings.DEFAULT);
    }

    public MinimumCurvatureGridder(MinimumCurvatureSettings settings) {
        if (settings == null) {
            throw new IllegalArgumentException("minimum-curvature settings missing");
        }
        this.settings = settings;
    }

    @Override
    public GriddingResult grid(GriddingInput input) {
        if (input == null) {
            throw new IllegalArgumentException("gridding input missing");
        }
        GridGeometry fine = input.target();
        List<XyzPoint> data = input.pointsWithContourSamples(Math.min(fine.dx(), fine.dy()) / 2);
        RegularGrid previous = null;
        CurvatureLevel.Solution solution = null;
        for (int step = coarsestStep(fine); step >= 1; step /= 2) {
            GridGeometry level = coarsened(fine, step);
            NodeLinks links = new NodeLinks(level, input.barriers());
            NodeData nodeData = new NodeData(links, data, input.barriers());
            if (step == 1 && Double.isNaN(nodeData.meanZ())) {
                throw new IllegalArgumentException("no control point or contour lies on the grid (within half a cell"
                        + " of its nodes, outside fault polygons); check the grid extent and the data units");
            }
            CurvatureLevel equations = new CurvatureLevel(links, nodeData, settings.tension());
            double[] start = startValues(level, previous, input.barriers(), nodeData.meanZ());
            double rms = step == 1 ? FINE_RMS_FRACTION * settings.tolerance() : step * settings.tolerance();
            solution = CurvatureSolver.solve(equations, start, rms, settings.maxIterations());
            previous = new RegularGrid(level, solution.values());
        }
        ResidualReport residuals = ResidualReport.of(previous, input.barriers(), input.digitizedPoints());
        return new GriddingResult(previous, residuals, solution.iterations(), solution.converged());
    }

    /** Largest power-of-two multiple of the node spacing that still leaves the coarsest grid enough cells. */
    static int coarsestStep(GridGeometry fine) {
        int step = 1;
        while ((fine.nx() - 1) / (2 * step) >= COARSEST_INTERVALS
                && (fine.ny() - 1) / (2 * step) >= COARSEST_INTERVALS) {
            step *= 2;
        }
        return step;
    }

    /** Every {@code step}-th node of {@code fine}, extended by one node where the fine grid does not divide evenly. */
    static GridGeometry coarsened(GridGeometry fine, int step) {
        if (step == 1) {
            return fine;
        }
        int nx = Math.floorDiv(fine.nx() - 2, step) + 2;
        int ny = Math.floorDiv(fine.ny() - 2, step) + 2;
        return new GridGeometry(nx, ny, fine.x0(), fine.y0(), step * fine.dx(), step * fine.dy());
    }

    /** The coarser solution read at this level's nodes; the mean data depth where it has none. */
    private static double[] startValues(GridGeometry level, RegularGrid coarser, FaultBarriers barriers,
            double meanDepth) {
        double fill = Double.isNaN(meanDepth) ? 0 : meanDepth;
        double[] start = new double[level.size()];
        SurfaceSampler sampler = coarser == null ? null : new SurfaceSampler(coarser, barriers);
        for (int k = 0; k < start.length; k++) {
            double value = sampler == null ? Double.NaN
                    : sampler.valueAt(level.x(level.column(k)), level.y(level.row(k)));
            start[k] = Double.isNaN(value) ? fill : value;
        }
        return start;
    }
}
