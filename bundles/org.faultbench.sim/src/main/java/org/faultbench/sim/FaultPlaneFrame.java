package org.faultbench.sim;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.FaultPlaneSampler;
import org.faultbench.faults.Wall;

/**
 * The nominal fault-plane columns of one bounding fault in primitive arrays, which side the compartment is on,
 * and the (u, z) cell frame on which leak probability is counted.
 */
final class FaultPlaneFrame {
    /** Room above and below the deepest and shallowest cut-off, beyond the column itself, m. */
    private static final double MARGIN = 50;
    /** How far, in rows, an estimate must lie from a whole row for {@link #rowCentredAtOrBelow} to trust it. */
    private static final double ESTIMATE_TOLERANCE = 1e-6;
    /** Frames up to this size in rows (counting zTop from 0) leave rounding far below {@link #ESTIMATE_TOLERANCE}. */
    private static final double MAX_ROWS_FOR_SHORTCUT = 1e8;

    final BoundingFault bounding;
    final int index;
    final int columns;
    final double[] u;
    final double[] x;
    final double[] y;
    final double[] footwall;
    final double[] hangingWall;
    final boolean[] hasData;
    final Wall compartmentWall;
    final double columnWidth;
    /** Leak-probability cells: rows of height {@link #cellHeight} from {@link #zTop} down. */
    final double zTop;
    final double cellHeight;
    private final double inverseCellHeight;
    /** Depth of the centre of row 0, as {@link #rowCentre} gives it. */
    private final double firstCentre;
    final int rows;
    private final double[] rowCentres;
    /** See {@link #rowCentredAtOrBelow}: 0.5 turns the shortcut off for a frame too large to vouch for it. */
    private final double estimateTolerance;

    FaultPlaneFrame(BoundingFault bounding, int index, double crestX, double crestY, ResolvedColumn nominal,
            int referenceUnit, double cellHeight) {
        this.bounding = bounding;
        this.index = index;
        FaultPlaneColumns plane = new FaultPlaneSampler(bounding.columns()).sample(bounding.fault(),
                bounding.footwallCutOff(), bounding.hangingWallCutOff());
        columns = plane.count();
        columnWidth = plane.width();
        u = new double[columns];
        x = new double[columns];
        y = new double[columns];
        footwall = new double[columns];
        hangingWall = new double[columns];
        hasData = new boolean[columns];
        double shallowest = Double.POSITIVE_INFINITY;
        double deepest = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < columns; k++) {
            u[k] = plane.u(k);
            x[k] = plane.x(k);
            y[k] = plane.y(k);
            footwall[k] = plane.footwallDepth(k);
            hangingWall[k] = plane.hangingWallDepth(k);
            hasData[k] = plane.hasData(k);
            if (hasData[k]) {
                shallowest = Math.min(shallowest, Math.min(footwall[k], hangingWall[k]));
                deepest = Math.max(deepest, Math.max(footwall[k], hangingWall[k]));
            }
        }
        if (shallowest > deepest) {
            throw new IllegalArgumentException("fault '" + bounding.id() + "': no fault-plane column has cut-off depths"
                    + " on both walls");
        }
        compartmentWall = bounding.fault().wallAt(crestX, crestY).orElseThrow(() -> new IllegalArgumentException(
                "the compartment crest lies on the trace of fault '" + bounding.id() + "'"));
        this.cellHeight = cellHeight;
        this.inverseCellHeight = 1 / cellHeight;
        zTop = shallowest - nominal.top(referenceUnit) - MARGIN;
        double zBase = deepest + (nominal.thickness() - nominal.top(referenceUnit)) + MARGIN;
        rows = (int) Math.ceil((zBase - zTop) / cellHeight);
        rowCentres = new double[rows];
        for (int row = 0; row < rows; row++) {
            rowCentres[row] = zTop + (row + 0.5) * cellHeight;
        }
        firstCentre = zTop + 0.5 * cellHeight;
        boolean small = Math.abs(zTop) * inverseCellHeight + rows < MAX_ROWS_FOR_SHORTCUT;
        estimateTolerance = small ? ESTIMATE_TOLERANCE : 0.5;
    }

    boolean compartmentOnFootwall() {
        return compartmentWall == Wall.FOOTWALL;
    }

    int cells() {
        return rows * columns;
    }

    /** Row of the cell containing depth z, or -1 / rows outside the frame. */
    int row(double z) {
        double r = Math.floor((z - zTop) / cellHeight);
        return r < 0 ? -1 : (int) Math.min(r, rows);
    }

    double rowCentre(int row) {
        return rowCentres[row];
    }

    /**
     * The first row whose centre lies at or below depth z (0 .. rows). Exact for the centres {@link #rowCentre} gives:
     * the estimate from the reciprocal height may be off by one either way, and the steps after it correct that.
     */
    int firstRowCentredAtOrBelow(double z) {
        return rowCentredAtOrBelow(z, firstCentre, inverseCellHeight, rowCentres, rows, estimateTolerance);
    }

    /** The arguments {@link #rowCentredAtOrBelow} takes for this frame, for a loop that keeps them in locals. */
    double firstCentre() {
        return firstCentre;
    }

    double inverseCellHeight() {
        return inverseCellHeight;
    }

    double[] rowCentres() {
        return rowCentres;
    }

    double estimateTolerance() {
        return estimateTolerance;
    }

    /**
     * {@link #firstRowCentredAtOrBelow} with the frame's numbers as arguments, so that a loop over millions of windows
     * keeps them in registers. The row is ceil(x), x = (z - c0) / h with c0 the first centre, when x lies clear of a
     * whole number: computing x rounds four times (c0, the difference, 1 / h, the product) and each centre once, which
     * in a frame of fewer than {@value #MAX_ROWS_FOR_SHORTCUT} rows (|zTop| / h included) moves x against the centres
     * by less than 10^-7 rows (6 · 2^-53 · 10^8), well inside {@link #ESTIMATE_TOLERANCE}. Otherwise, and outside the
     * frame, the estimate is checked against the centres themselves.
     */
    static int rowCentredAtOrBelow(double z, double firstCentre, double inverseCellHeight, double[] centres,
            int rows, double tolerance) {
        double x = (z - firstCentre) * inverseCellHeight;
        double estimate = Math.ceil(x);
        double gap = estimate - x;
        if (gap > tolerance && gap < 1 - tolerance && estimate >= 0 && estimate <= rows) {
            return (int) estimate;
        }
        // clamped to [0, rows] by comparisons: cheaper than Math.min in a loop over millions of windows
        int row = estimate < 0 ? 0 : estimate > rows ? rows : (int) estimate;
        while (row > 0 && centres[row - 1] >= z) {
            row--;
        }
        while (row < rows && centres[row] < z) {
            row++;
        }
        return row;
    }
}
