package org.faultbench.faults;

import org.locationtech.jts.geom.Coordinate;

/**
 * Cuts a fault plane into equal-width columns along strike over the stretch where both reference-horizon cut-off
 * lines are defined, reading each cut-off at the column centre (midpoint rule: window areas are interval length
 * times column width).
 */
public final class FaultPlaneSampler {

    private final int columnCount;

    /** @param columnCount number of columns, &ge; 1 */
    public FaultPlaneSampler(int columnCount) {
        if (columnCount < 1) {
            throw new IllegalArgumentException("number of fault-plane columns must be >= 1, was " + columnCount);
        }
        this.columnCount = columnCount;
    }

    /** Samples {@code fault} between the reference-horizon cut-off lines of its two walls. */
    public FaultPlaneColumns sample(Fault fault, CutOffLine footwall, CutOffLine hangingWall) {
        checkCutOffs(fault, footwall, hangingWall);
        double start = Math.max(0, Math.max(footwall.minU(), hangingWall.minU()));
        double end = Math.min(fault.length(), Math.min(footwall.maxU(), hangingWall.maxU()));
        if (!(end > start)) {
            throw new IllegalArgumentException("fault '" + fault.name() + "': the footwall and hanging-wall cut-offs of"
                    + " horizon '" + footwall.horizon() + "' do not overlap along the trace");
        }
        double width = (end - start) / columnCount;
        double[] u = new double[columnCount];
        double[] x = new double[columnCount];
        double[] y = new double[columnCount];
        double[] zFootwall = new double[columnCount];
        double[] zHangingWall = new double[columnCount];
        for (int k = 0; k < columnCount; k++) {
            u[k] = start + (k + 0.5) * width;
            Coordinate position = fault.positionAt(u[k]);
            x[k] = position.x;
            y[k] = position.y;
            zFootwall[k] = footwall.depthAt(u[k]);
            zHangingWall[k] = hangingWall.depthAt(u[k]);
        }
        return new FaultPlaneColumns(fault.id(), footwall.horizon(), width, u, x, y, zFootwall, zHangingWall);
    }

    private static void checkCutOffs(Fault fault, CutOffLine footwall, CutOffLine hangingWall) {
        if (footwall.wall() != Wall.FOOTWALL || hangingWall.wall() != Wall.HANGING_WALL) {
            throw new IllegalArgumentException("fault '" + fault.name() + "': expected a footwall then a hanging-wall"
                    + " cut-off line, got " + CutOffLine.wallName(footwall.wall()) + " and "
                    + CutOffLine.wallName(hangingWall.wall()));
        }
        if (!footwall.horizon().equals(hangingWall.horizon())) {
            throw new IllegalArgumentException("fault '" + fault.name() + "': footwall cut-off is of horizon '"
                    + footwall.horizon() + "' but hanging-wall cut-off of horizon '" + hangingWall.horizon() + "'");
        }
        for (CutOffLine line : new CutOffLine[] {footwall, hangingWall}) {
            if (!line.faultId().equals(fault.id())) {
                throw new IllegalArgumentException("fault '" + fault.name() + "': the " + CutOffLine.wallName(line.wall())
                        + " cut-off line belongs to fault '" + line.faultId() + "'");
            }
        }
    }
}
