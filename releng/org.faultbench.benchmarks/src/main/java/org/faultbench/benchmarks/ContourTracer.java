package org.faultbench.benchmarks;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.function.DoubleBinaryOperator;

import org.faultbench.digitize.gridding.ContourLine;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.operation.linemerge.LineMerger;

/**
 * Contours of an analytic surface by marching squares (Lorensen &amp; Cline 1987 in two dimensions; from memory):
 * on a fine grid each cell contributes a segment between the two edges a contour level crosses, linearly
 * interpolated; JTS's {@link LineMerger} joins the segments into polylines. Cells whose corners lie in different fault
 * blocks are skipped, so that no contour is drawn down a fault step. Saddle cells (four crossings) are split by the
 * corner order, which can join the wrong pairs; for benchmark data that is harmless.
 */
final class ContourTracer {
    private static final GeometryFactory FACTORY = new GeometryFactory();

    private final int nx;
    private final int ny;
    private final double x0;
    private final double y0;
    private final double spacing;
    private final double[] z;
    private final int[] block;

    ContourTracer(int nx, int ny, double x0, double y0, double spacing, DoubleBinaryOperator surface,
            FaultBlocks blockOf) {
        this.nx = nx;
        this.ny = ny;
        this.x0 = x0;
        this.y0 = y0;
        this.spacing = spacing;
        z = new double[nx * ny];
        block = new int[nx * ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                double x = x0 + i * spacing;
                double y = y0 + j * spacing;
                z[j * nx + i] = surface.applyAsDouble(x, y);
                block[j * nx + i] = blockOf.of(x, y);
            }
        }
    }

    /** Every contour at a multiple of {@code interval} within the surface's range, as merged polylines. */
    List<ContourLine> contours(double interval) {
        double min = Double.POSITIVE_INFINITY;
        for (double v : z) {
            min = Math.min(min, v);
        }
        long first = (long) Math.ceil(min / interval);
        List<List<LineString>> segmentsByLevel = new ArrayList<>();
        for (int j = 0; j + 1 < ny; j++) {
            for (int i = 0; i + 1 < nx; i++) {
                addCellSegments(j * nx + i, interval, first, segmentsByLevel);
            }
        }
        List<ContourLine> lines = new ArrayList<>();
        for (int m = 0; m < segmentsByLevel.size(); m++) {
            for (LineString line : merged(segmentsByLevel.get(m))) {
                lines.add(new ContourLine(line, (first + m) * interval));
            }
        }
        return lines;
    }

    /** The segments of every level crossing the cell with lower-left node k, unless a fault cuts the cell. */
    private void addCellSegments(int k, double interval, long first, List<List<LineString>> segmentsByLevel) {
        int[] corners = { k, k + 1, k + nx + 1, k + nx };
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (int c : corners) {
            if (block[c] != block[k]) {
                return;
            }
            low = Math.min(low, z[c]);
            high = Math.max(high, z[c]);
        }
        for (long m = (long) Math.ceil(low / interval); m * interval <= high; m++) {
            double level = m * interval;
            List<Coordinate> crossings = new ArrayList<>(4);
            for (int e = 0; e < 4; e++) {
                int a = corners[e];
                int b = corners[(e + 1) % 4];
                if ((z[a] < level) != (z[b] < level)) {
                    crossings.add(crossing(a, b, level));
                }
            }
            int index = (int) (m - first);
            while (segmentsByLevel.size() <= index) {
                segmentsByLevel.add(new ArrayList<>());
            }
            for (int c = 0; c + 1 < crossings.size(); c += 2) {
                segmentsByLevel.get(index).add(
                        FACTORY.createLineString(new Coordinate[] { crossings.get(c), crossings.get(c + 1) }));
            }
        }
    }

    /** Where the level crosses edge ab; computed from the lower node so that both cells of an edge agree exactly. */
    private Coordinate crossing(int first, int second, double level) {
        int a = Math.min(first, second);
        int b = Math.max(first, second);
        double t = (level - z[a]) / (z[b] - z[a]);
        double xa = x0 + (a % nx) * spacing;
        double ya = y0 + (a / nx) * spacing;
        double xb = x0 + (b % nx) * spacing;
        double yb = y0 + (b / nx) * spacing;
        return new Coordinate(xa + t * (xb - xa), ya + t * (yb - ya));
    }

    /** Key of the fault block holding a point: equal keys mean no fault lies between two points. */
    interface FaultBlocks {
        int of(double x, double y);
    }

    @SuppressWarnings("unchecked")
    private static Collection<LineString> merged(List<LineString> segments) {
        LineMerger merger = new LineMerger();
        for (Geometry segment : segments) {
            merger.add(segment);
        }
        return merger.getMergedLineStrings();
    }
}
