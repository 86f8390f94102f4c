package org.faultbench.benchmarks;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.digitize.gridding.ContourLine;
import org.faultbench.digitize.gridding.FaultBarriers;
import org.faultbench.digitize.gridding.GriddingInput;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * The invented horizon of the gridding benchmark, sized like the performance target of the map workflow: a tilted
 * dome on a 10 km square cut by {@value #FAULT_COUNT} normal faults, contoured to about 100,000 vertices and gridded
 * to 1000 × 1000 nodes.
 * <ul>
 * <li>Dome: z = 2000 + 0.03·x + 0.01·y − 250·exp(−r²/(2·3000²)) m, r measured from (5000, 5000): crest about 1900 m,
 * deepening to the east.</li>
 * <li>Faults: straight traces; east of a trace (on its right looking from its first to its last point) the horizon is
 * dropped by the throw, which is largest mid-trace and falls to 0 at both tips (throw·4s(1 − s), s the position
 * along the trace from 0 to 1), so the horizon is continuous round a fault tip. Three traces run across the whole
 * map, two end inside it; one crosses two others.</li>
 * <li>Contours: every {@value #CONTOUR_INTERVAL} m, traced by marching squares on a 5 m analytic grid and merged into
 * polylines; cells that a fault cuts are skipped, so contours stop at the faults as on a hand-drawn map.</li>
 * </ul>
 */
public final class FaultedDome {
    public static final int FAULT_COUNT = 5;
    /** Contour interval, metres: chosen so that the contours have about 100,000 vertices. */
    public static final double CONTOUR_INTERVAL = 10;
    private static final GeometryFactory FACTORY = new GeometryFactory();
    private static final double SIDE = 9990;
    private static final double TRACING_SPACING = 5;

    /** The five faults as (x1, y1, x2, y2, maximum throw), metres. */
    private static final double[][] FAULTS = {
        { 1500, -500, 3500, 10_500, 80 },
        { 6000, -500, 7500, 10_500, 60 },
        { -500, 7000, 10_500, 8000, 40 },
        { 4000, 2000, 6000, 5000, 50 },
        { 7500, 1500, 9500, 4500, 30 },
    };

    private FaultedDome() {
    }

    /** 1000 × 1000 nodes every 10 m over the map. */
    public static GridGeometry grid() {
        return new GridGeometry(1000, 1000, 0, 0, 10, 10);
    }

    /** Depth of the horizon at (x, y), metres, positive downward. */
    public static double depth(double x, double y) {
        double r2 = (x - 5000) * (x - 5000) + (y - 5000) * (y - 5000);
        double z = 2000 + 0.03 * x + 0.01 * y - 250 * Math.exp(-r2 / (2 * 3000.0 * 3000.0));
        for (double[] f : FAULTS) {
            double s = along(f, x, y);
            if (s > 0 && s < 1 && rightOf(f, x, y)) {
                z += f[4] * 4 * s * (1 - s);
            }
        }
        return z;
    }

    /** Which side of each fault (within its length) the point lies on, as bits: equal keys mean no fault between. */
    static int block(double x, double y) {
        int key = 0;
        for (int k = 0; k < FAULTS.length; k++) {
            double s = along(FAULTS[k], x, y);
            if (s > 0 && s < 1 && rightOf(FAULTS[k], x, y)) {
                key |= 1 << k;
            }
        }
        return key;
    }

    private static double along(double[] f, double x, double y) {
        double ux = f[2] - f[0];
        double uy = f[3] - f[1];
        return ((x - f[0]) * ux + (y - f[1]) * uy) / (ux * ux + uy * uy);
    }

    private static boolean rightOf(double[] f, double x, double y) {
        return (f[2] - f[0]) * (y - f[1]) - (f[3] - f[1]) * (x - f[0]) < 0;
    }

    /** The fault traces as barriers. */
    public static FaultBarriers barriers() {
        List<LineString> traces = new ArrayList<>();
        for (double[] f : FAULTS) {
            traces.add(FACTORY.createLineString(
                    new Coordinate[] { new Coordinate(f[0], f[1]), new Coordinate(f[2], f[3]) }));
        }
        return FaultBarriers.of(traces, List.of());
    }

    /** The contours of the horizon (see the class comment). */
    public static List<ContourLine> contours() {
        int n = (int) Math.round(SIDE / TRACING_SPACING) + 1;
        return new ContourTracer(n, n, 0, 0, TRACING_SPACING, FaultedDome::depth, FaultedDome::block)
                .contours(CONTOUR_INTERVAL);
    }

    /** Contours, faults and the 1000 × 1000 grid: the whole benchmark input. */
    public static GriddingInput input() {
        return new GriddingInput(List.of(), contours(), barriers(), grid());
    }

    /** Total number of contour vertices of {@code contours}. */
    public static int vertexCount(List<ContourLine> contours) {
        return contours.stream().mapToInt(c -> c.line().getNumPoints()).sum();
    }
}
