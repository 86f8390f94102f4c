package org.faultbench.strat;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;

/**
 * A unit's thickness map: an isochore grid (true vertical thickness, m) times a scale factor drawn once per
 * realisation, so the whole map thickens or thins together (the grid's shape is taken as known, its level as
 * uncertain). Thicknesses are interpolated bilinearly and clamped at 0 (gridding can undershoot near zero edges).
 * Positions where the grid has no value are an error: a study must load only isochores that cover its compartment.
 *
 * @param source where the grid came from (file name), for messages
 * @param grid thickness grid, m
 * @param scale multiplicative factor, &ge; 0 (normal and lognormal tails cut at 0)
 */
public record Isochore(String source, RegularGrid grid, UncertainValue scale) {

    public Isochore {
        if (grid == null) {
            throw new IllegalArgumentException("isochore " + source + ": grid is missing");
        }
        if (scale == null) {
            throw new IllegalArgumentException("isochore " + source + ": scale is missing");
        }
        scale = scale.within(Bounds.NON_NEGATIVE, "isochore " + source + " scale");
    }

    /**
     * Bilinear grid thickness at (x, y) before scaling, NaN outside the grid or next to a null node. Written as the
     * corner value plus weighted differences, so that a grid of one constant value gives that value to the last bit
     * (a constant isochore then reproduces the constant-thickness results exactly).
     */
    public double gridThicknessAt(double x, double y) {
        GridGeometry g = grid.geometry();
        double tx = (x - g.x0()) / g.dx();
        double ty = (y - g.y0()) / g.dy();
        if (!(tx >= 0 && tx <= g.nx() - 1 && ty >= 0 && ty <= g.ny() - 1)) {
            return Double.NaN;
        }
        int i = Math.min((int) tx, Math.max(0, g.nx() - 2));
        int j = Math.min((int) ty, Math.max(0, g.ny() - 2));
        double fx = tx - i;
        double fy = ty - j;
        int i1 = Math.min(i + 1, g.nx() - 1);
        int j1 = Math.min(j + 1, g.ny() - 1);
        double v00 = grid.value(i, j);
        double v10 = grid.value(i1, j);
        double v01 = grid.value(i, j1);
        double v11 = grid.value(i1, j1);
        if (Double.isNaN(v00) || Double.isNaN(v10) || Double.isNaN(v01) || Double.isNaN(v11)) {
            return Double.NaN;
        }
        return v00 + fx * (v10 - v00) + fy * (v01 - v00) + fx * fy * (v11 - v10 - v01 + v00);
    }

    /** Thickness at (x, y) for a drawn scale factor, m, &ge; 0. */
    public double thicknessAt(double scaleFactor, double x, double y) {
        double value = gridThicknessAt(x, y);
        if (Double.isNaN(value)) {
            throw new IllegalArgumentException("isochore " + source + " has no value at x " + x + ", y " + y
                    + " (outside the grid or next to a null node)");
        }
        return Math.max(0, scaleFactor * value);
    }

    /** Mean of the grid's non-null nodes, clamped at 0, times the scale factor: a thickness for displays. */
    public double meanThickness(double scaleFactor) {
        double sum = 0;
        int n = 0;
        for (int k = 0; k < grid.geometry().size(); k++) {
            if (!grid.isNull(k)) {
                sum += Math.max(0, grid.value(k));
                n++;
            }
        }
        return n == 0 ? 0 : scaleFactor * sum / n;
    }
}
