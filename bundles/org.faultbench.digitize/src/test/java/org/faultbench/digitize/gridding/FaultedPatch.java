package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.digitize.io.XyzPoint;

/**
 * A small invented faulted horizon for the solver tests: the paraboloid of {@link SyntheticHorizons} on 41 &times; 41
 * nodes every 25 m, cut by an oblique fault from the south edge that ends inside the grid at (600, 700), with the
 * hanging wall (east of the trace, south of the tip) dropped 40 m, plus a fault polygon west of the trace.
 */
final class FaultedPatch {
    static final GridGeometry GRID = new GridGeometry(41, 41, 0, 0, 25, 25);
    static final double[] TRACE = { 300, -50, 600, 700 };

    private FaultedPatch() {
    }

    static FaultBarriers barriers() {
        return FaultBarriers.of(List.of(SyntheticHorizons.line(TRACE[0], TRACE[1], TRACE[2], TRACE[3])),
                List.of(SyntheticHorizons.rectangle(100, 800, 180, 900)));
    }

    /** Whether (x, y) lies east of the trace, within its length (positive along the trace from its first point). */
    static boolean eastOfTrace(double x, double y) {
        double ux = TRACE[2] - TRACE[0];
        double uy = TRACE[3] - TRACE[1];
        double along = ((x - TRACE[0]) * ux + (y - TRACE[1]) * uy) / (ux * ux + uy * uy);
        return along > 0 && along < 1 && ux * (y - TRACE[1]) - uy * (x - TRACE[0]) < 0;
    }

    static double depth(double x, double y) {
        return SyntheticHorizons.PARABOLOID.applyAsDouble(x, y) + (eastOfTrace(x, y) ? 40 : 0);
    }

    /** 250 points at random positions (java.util.Random seed 11, the same on every JVM), none on the trace. */
    static List<XyzPoint> points() {
        Random random = new Random(11);
        List<XyzPoint> points = new ArrayList<>();
        while (points.size() < 250) {
            double x = 1000 * random.nextDouble();
            double y = 1000 * random.nextDouble();
            points.add(new XyzPoint(x, y, depth(x, y)));
        }
        return points;
    }

    static CurvatureLevel equations(double tension) {
        FaultBarriers barriers = barriers();
        NodeLinks links = new NodeLinks(GRID, barriers);
        return new CurvatureLevel(links, new NodeData(links, points(), barriers), tension);
    }
}
