package org.faultbench.digitize.gridding;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;

/**
 * Reads a gridded surface at any map point without mixing values from the far side of a fault, for residuals at
 * data points, cut-off lines beside a fault trace and the coarse-to-fine start of minimum curvature.
 * <p>
 * Rule: of the four nodes around the point, only those with a value and an open straight path to the point (see
 * {@link FaultBarriers}) are used. Four usable nodes: bilinear interpolation. Three: the plane through them, which
 * keeps a planar surface exact beside a fault. One or two: their bilinear weights renormalised. None, a point
 * outside the span of the outer nodes, or a point inside a fault polygon: NaN.
 */
public final class SurfaceSampler {
    private final RegularGrid surface;
    private final FaultBarriers barriers;
    private final GridMask nearBarrier;

    public SurfaceSampler(RegularGrid surface, FaultBarriers barriers) {
        if (surface == null || barriers == null) {
            throw new IllegalArgumentException("surface or fault barriers missing");
        }
        this.surface = surface;
        this.barriers = barriers;
        this.nearBarrier = barriers.nearNodes(surface.geometry());
    }

    /** Surface value at map (x, y), metres; NaN where the rule above gives none. */
    public double valueAt(double x, double y) {
        GridGeometry g = surface.geometry();
        double tx = (x - g.x0()) / g.dx();
        double ty = (y - g.y0()) / g.dy();
        if (!(tx >= 0 && tx <= g.nx() - 1 && ty >= 0 && ty <= g.ny() - 1)) {
            return Double.NaN;
        }
        int i = Math.min((int) tx, g.nx() - 2);
        int j = Math.min((int) ty, g.ny() - 2);
        int k = g.index(i, j);
        int[] corners = { k, k + 1, k + g.nx(), k + g.nx() + 1 };
        boolean checkPaths = nearBarrier.contains(corners[0]) || nearBarrier.contains(corners[1])
                || nearBarrier.contains(corners[2]) || nearBarrier.contains(corners[3]);
        if (checkPaths && barriers.isInFaultPolygon(x, y)) {
            return Double.NaN;
        }
        double[] v = new double[4];
        int missing = -1;
        int usable = 0;
        for (int c = 0; c < 4; c++) {
            v[c] = surface.value(corners[c]);
            if (!Double.isNaN(v[c]) && checkPaths
                    && barriers.blocks(x, y, g.x(g.column(corners[c])), g.y(g.row(corners[c])))) {
                v[c] = Double.NaN;
            }
            if (Double.isNaN(v[c])) {
                missing = c;
            } else {
                usable++;
            }
        }
        return combine(v, usable, missing, tx - i, ty - j);
    }

    /** Corners are numbered 0 = (0,0), 1 = (1,0), 2 = (0,1), 3 = (1,1) in cell units; NaN = unusable. */
    private static double combine(double[] v, int usable, int missing, double fx, double fy) {
        if (usable == 4) {
            return (1 - fy) * ((1 - fx) * v[0] + fx * v[1]) + fy * ((1 - fx) * v[2] + fx * v[3]);
        }
        if (usable == 3) {
            return planeThroughThree(v, missing, fx, fy);
        }
        double[] w = { (1 - fx) * (1 - fy), fx * (1 - fy), (1 - fx) * fy, fx * fy };
        double sum = 0;
        double weight = 0;
        for (int c = 0; c < 4; c++) {
            if (!Double.isNaN(v[c])) {
                sum += w[c] * v[c];
                weight += w[c];
            }
        }
        return weight > 0 ? sum / weight : Double.NaN;
    }

    /** The plane through the three usable corners, evaluated at (fx, fy); corner index = 2 * row + column. */
    private static double planeThroughThree(double[] v, int missing, double fx, double fy) {
        int opposite = 3 - missing;
        int ox = opposite & 1;
        int oy = opposite >> 1;
        int rowMate = (oy << 1) | (missing & 1);
        int columnMate = (missing & 2) | ox;
        double slopeX = (v[rowMate] - v[opposite]) / ((missing & 1) - ox);
        double slopeY = (v[columnMate] - v[opposite]) / ((missing >> 1) - oy);
        return v[opposite] + (fx - ox) * slopeX + (fy - oy) * slopeY;
    }
}
