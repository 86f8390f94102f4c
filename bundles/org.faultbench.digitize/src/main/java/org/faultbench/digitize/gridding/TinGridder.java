package org.faultbench.digitize.gridding;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.stream.IntStream;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.locationtech.jts.geom.Envelope;

/**
 * Grids a horizon by linear interpolation in a triangulated irregular network (TIN): a conforming Delaunay
 * triangulation of the control points with the contours as constraints ({@link TinMesh}). Exact for a plane; the
 * surface is continuous but has kinks along triangle edges, and triangles whose three corners lie on one contour
 * are flat (terraces), the known weakness of TINs from contours.
 * <p>
 * Faults carry no depth, so they are not triangulated; instead each node uses only triangle corners it can see
 * without crossing a fault ({@link FaultBarriers}):
 * <ol>
 * <li>all three corners of the triangle holding the node visible: barycentric interpolation;</li>
 * <li>otherwise: among the triangles around the visible corners, the one whose three corners are all visible and
 * whose centroid is nearest; its plane is extended to the node (linear extrapolation up to the fault);</li>
 * <li>no such triangle, a node inside a fault polygon, or a node outside the triangulated area: null (NaN).</li>
 * </ol>
 * Contours of different depth that cross are refused.
 */
public final class TinGridder implements SurfaceGridder {
    /** Tolerance on barycentric weights for nodes on a triangle edge. */
    private static final double ON_EDGE = 1e-9;
    /**
     * Widening of a triangle's span on a node row, relative to the triangle's size (plus ON_EDGE node spacings, the
     * slack of the bounding-box test): far more than the barycentric tolerance ON_EDGE allows, so the exact weight test below still decides and the span only skips nodes that are
     * certainly outside (long thin triangles along contours have bounding boxes far larger than themselves).
     */
    private static final double SCAN_MARGIN = 1e-6;

    @Override
    public GriddingResult grid(GriddingInput input) {
        return grid(input, Runtime.getRuntime().availableProcessors());
    }

    /**
     * Grids with the node rows split into {@code bands} bands filled in parallel. Every band visits the triangles in
     * the same order and a node takes the first triangle that holds it, so the surface does not depend on the number
     * of bands.
     */
    GriddingResult grid(GriddingInput input, int bands) {
        if (input == null) {
            throw new IllegalArgumentException("gridding input missing");
        }
        GridGeometry g = input.target();
        TinMesh mesh = TinMesh.build(input);
        double[] values = new double[g.size()];
        Arrays.fill(values, Double.NaN);
        boolean[] done = new boolean[g.size()];
        int count = Math.max(1, Math.min(bands, g.ny()));
        IntStream.range(0, count).parallel().forEach(band -> {
            int rowFrom = (int) ((long) g.ny() * band / count);
            int rowTo = (int) ((long) g.ny() * (band + 1) / count) - 1;
            for (int t = 0; t < mesh.triangleCount(); t++) {
                fillTriangle(mesh, t, input.barriers(), g, rowFrom, rowTo, values, done);
            }
        });
        RegularGrid surface = new RegularGrid(g, values);
        ResidualReport residuals = ResidualReport.of(surface, input.barriers(), input.digitizedPoints());
        return new GriddingResult(surface, residuals, 0, true);
    }

    /** Fills the nodes of rows {@code rowFrom..rowTo} that triangle {@code t} holds and no earlier one did. */
    private static void fillTriangle(TinMesh mesh, int t, FaultBarriers barriers, GridGeometry g, int rowFrom,
            int rowTo, double[] values, boolean[] done) {
        Envelope box = mesh.envelope(t);
        int iFrom = Math.max(0, (int) Math.ceil((box.getMinX() - g.x0()) / g.dx() - ON_EDGE));
        int iTo = Math.min(g.nx() - 1, (int) Math.floor((box.getMaxX() - g.x0()) / g.dx() + ON_EDGE));
        int jFrom = Math.max(rowFrom, (int) Math.ceil((box.getMinY() - g.y0()) / g.dy() - ON_EDGE));
        int jTo = Math.min(rowTo, (int) Math.floor((box.getMaxY() - g.y0()) / g.dy() + ON_EDGE));
        if (jFrom > jTo || iFrom > iTo) {
            return;
        }
        boolean nearFault = !barriers.isEmpty() && barriers.touchesTriangle(mesh.ring(t));
        double margin = SCAN_MARGIN * (box.getWidth() + box.getHeight()) + ON_EDGE * g.dx();
        for (int j = jFrom; j <= jTo; j++) {
            double[] span = mesh.span(t, g.y(j));
            int iStart = Math.max(iFrom, (int) Math.ceil((span[0] - margin - g.x0()) / g.dx()));
            int iEnd = Math.min(iTo, (int) Math.floor((span[1] + margin - g.x0()) / g.dx()));
            for (int i = iStart; i <= iEnd; i++) {
                int k = g.index(i, j);
                double[] w = done[k] ? null : mesh.weights(t, g.x(i), g.y(j));
                if (w != null && w[0] >= -ON_EDGE && w[1] >= -ON_EDGE && w[2] >= -ON_EDGE) {
                    done[k] = true;
                    values[k] = nearFault ? valueBesideFault(mesh, t, w, g.x(i), g.y(j), barriers)
                            : mesh.planeDepth(t, w);
                }
            }
        }
    }

    /** Rules 1 to 3 of the class comment for a node in a triangle that a fault touches. */
    private static double valueBesideFault(TinMesh mesh, int t, double[] w, double x, double y,
            FaultBarriers barriers) {
        if (barriers.isInFaultPolygon(x, y)) {
            return Double.NaN;
        }
        Map<Integer, Boolean> visible = new HashMap<>();
        if (allCornersVisible(mesh, t, x, y, barriers, visible)) {
            return mesh.planeDepth(t, w);
        }
        int best = -1;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int c = 0; c < 3; c++) {
            int vertex = mesh.corner(t, c);
            if (!visible.get(vertex)) {
                continue;
            }
            for (int candidate : mesh.trianglesAt(vertex)) {
                double distance = centroidDistance(mesh, candidate, x, y);
                if (distance < bestDistance && allCornersVisible(mesh, candidate, x, y, barriers, visible)
                        && mesh.weights(candidate, x, y) != null) {
                    best = candidate;
                    bestDistance = distance;
                }
            }
        }
        return best < 0 ? Double.NaN : mesh.planeDepth(best, mesh.weights(best, x, y));
    }

    private static boolean allCornersVisible(TinMesh mesh, int t, double x, double y, FaultBarriers barriers,
            Map<Integer, Boolean> visible) {
        boolean all = true;
        for (int c = 0; c < 3; c++) {
            int v = mesh.corner(t, c);
            all &= visible.computeIfAbsent(v, key -> !barriers.blocks(x, y, mesh.x(key), mesh.y(key)));
        }
        return all;
    }

    private static double centroidDistance(TinMesh mesh, int t, double x, double y) {
        double cx = 0;
        double cy = 0;
        for (int c = 0; c < 3; c++) {
            cx += mesh.x(mesh.corner(t, c)) / 3;
            cy += mesh.y(mesh.corner(t, c)) / 3;
        }
        return Math.hypot(cx - x, cy - y);
    }
}
