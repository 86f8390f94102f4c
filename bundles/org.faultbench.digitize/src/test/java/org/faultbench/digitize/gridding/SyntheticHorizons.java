package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.DoubleBinaryOperator;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.XyzPoint;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/** Analytic test surfaces and data sampled from them; all invented, metres, depth positive downward. */
final class SyntheticHorizons {
    static final GeometryFactory FACTORY = new GeometryFactory();
    /** 101 x 101 nodes every 10 m: x, y in [0, 1000]. */
    static final GridGeometry GRID = new GridGeometry(101, 101, 0, 0, 10, 10);
    /** x of a north-south fault trace, half-way between node columns 50 (x 500) and 51 (x 510). */
    static final double FAULT_X = 505;
    /** The trace, running north from beyond the south edge to beyond the north edge. */
    static final LineString FAULT_TRACE = line(FAULT_X, -50, FAULT_X, 1050);

    /** A dipping plane z = 1500 + 0.08 x - 0.05 y. */
    static final DoubleBinaryOperator PLANE = (x, y) -> 1500 + 0.08 * x - 0.05 * y;
    /** An anticline z = 1200 + 2e-4 r&sup2;, crest at (500, 500): 1200 m at the crest, 1300 m at r = 707 m. */
    static final DoubleBinaryOperator PARABOLOID =
            (x, y) -> 1200 + 2e-4 * ((x - 500) * (x - 500) + (y - 500) * (y - 500));
    /** A plane z = 1000 + 0.1 x, dropped 50 m east of the fault (normal fault, hanging wall to the east). */
    static final DoubleBinaryOperator STEPPED = (x, y) -> 1000 + 0.1 * x + (x > FAULT_X ? 50 : 0);

    private SyntheticHorizons() {
    }

    /** {@code count} points at random positions in [0, 1000]&sup2; (fixed seed), none within 2 m of the fault. */
    static List<XyzPoint> scattered(DoubleBinaryOperator surface, int count, long seed) {
        Random random = new Random(seed);
        List<XyzPoint> points = new ArrayList<>();
        while (points.size() < count) {
            double x = 1000 * random.nextDouble();
            double y = 1000 * random.nextDouble();
            if (Math.abs(x - FAULT_X) > 2) {
                points.add(new XyzPoint(x, y, surface.applyAsDouble(x, y)));
            }
        }
        return points;
    }

    /** Points on the corners of the data square, so that a triangulation covers the whole grid. */
    static List<XyzPoint> corners(DoubleBinaryOperator surface) {
        List<XyzPoint> points = new ArrayList<>();
        for (double[] c : new double[][] { { 0, 0 }, { 1000, 0 }, { 0, 1000 }, { 1000, 1000 } }) {
            points.add(new XyzPoint(c[0], c[1], surface.applyAsDouble(c[0], c[1])));
        }
        return points;
    }

    static LineString line(double x1, double y1, double x2, double y2) {
        return FACTORY.createLineString(new Coordinate[] { new Coordinate(x1, y1), new Coordinate(x2, y2) });
    }

    static Polygon rectangle(double x1, double y1, double x2, double y2) {
        return FACTORY.createPolygon(new Coordinate[] { new Coordinate(x1, y1), new Coordinate(x2, y1),
            new Coordinate(x2, y2), new Coordinate(x1, y2), new Coordinate(x1, y1) });
    }

    static FaultBarriers faultTrace() {
        return FaultBarriers.of(List.of(FAULT_TRACE), List.of());
    }

    /** Largest |grid - surface| over the non-null nodes whose position passes {@code where}. */
    static double maxError(RegularGrid grid, DoubleBinaryOperator surface,
            DoubleBinaryOperator where) {
        double worst = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                double v = grid.value(i, j);
                if (!Double.isNaN(v) && where.applyAsDouble(grid.x(i), grid.y(j)) > 0) {
                    worst = Math.max(worst, Math.abs(v - surface.applyAsDouble(grid.x(i), grid.y(j))));
                }
            }
        }
        return worst;
    }

    /** Number of null nodes. */
    static int nullCount(RegularGrid grid) {
        int count = 0;
        for (int k = 0; k < grid.geometry().size(); k++) {
            count += grid.isNull(k) ? 1 : 0;
        }
        return count;
    }
}
