package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.digitize.io.XyzPoint;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.LineSegment;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.triangulate.ConformingDelaunayTriangulator;
import org.locationtech.jts.triangulate.ConstraintVertex;
import org.locationtech.jts.triangulate.Segment;
import org.locationtech.jts.triangulate.ConstraintEnforcementException;
import org.locationtech.jts.triangulate.quadedge.LocateFailureException;

/**
 * The triangles of a conforming Delaunay triangulation (JTS) of control points and contours, with a depth at every
 * vertex. Contours are constraints, so no triangle edge cuts across a contour. Vertices take the depth of the input
 * point or contour vertex at their position; points that JTS inserts to make the constraints conform lie on a contour
 * segment and take that contour's depth (the z that JTS gives such points is not reliable).
 * <p>
 * Contours are not densified beforehand: JTS's incremental triangulation can fail to locate points in long runs of
 * exactly collinear points (JTS issue 1121), which densifying straight contour segments creates; the conforming
 * triangulation adds the points it needs itself.
 * <p>
 * Vertices go in in a biased randomised order ({@link InsertionOrder}): in the sorted order of JTS's own builder,
 * the conforming triangulation of 100,000 contour vertices took 10 &ndash; 12 s of CPU time, in this order 2 &ndash; 4 s.
 */
final class TinMesh {
    private static final long INSERTION_SEED = 1974;
    private final double[] x;
    private final double[] y;
    private final double[] z;
    private final int[] corners;
    private final List<List<Integer>> trianglesAtVertex;

    private TinMesh(double[] x, double[] y, double[] z, int[] corners, List<List<Integer>> trianglesAtVertex) {
        this.x = x;
        this.y = y;
        this.z = z;
        this.corners = corners;
        this.trianglesAtVertex = trianglesAtVertex;
    }

    /** Triangulates the control points and contours of {@code input}. */
    static TinMesh build(GriddingInput input) {
        ContourCrossings.requireNone(input.contours());
        STRtree contourSegments = new STRtree();
        Map<Coordinate, Double> inputDepths = new HashMap<>();
        List<ConstraintVertex> sites = new ArrayList<>();
        for (XyzPoint p : input.points()) {
            Coordinate c = new Coordinate(p.x(), p.y(), p.z());
            if (inputDepths.putIfAbsent(c, p.z()) == null) {
                sites.add(new ConstraintVertex(c));
            }
        }
        Map<Coordinate, ConstraintVertex> constraintVertices = new HashMap<>();
        List<ConstraintVertex> segmentVertices = new ArrayList<>();
        List<Segment> segments = new ArrayList<>();
        for (ContourLine contour : input.contours()) {
            Coordinate[] points = contour.line().getCoordinates();
            for (int k = 0; k < points.length; k++) {
                points[k] = new Coordinate(points[k].x, points[k].y, contour.z());
                inputDepths.putIfAbsent(points[k], contour.z());
                if (!constraintVertices.containsKey(points[k])) {
                    ConstraintVertex vertex = new ConstraintVertex(points[k]);
                    constraintVertices.put(points[k], vertex);
                    segmentVertices.add(vertex);
                }
                if (k > 0) {
                    segments.add(new Segment(points[k - 1], points[k]));
                    contourSegments.insert(new Envelope(points[k - 1], points[k]),
                            new DepthSegment(new LineSegment(points[k - 1], points[k]), contour.z()));
                }
            }
        }
        sites.removeIf(site -> constraintVertices.containsKey(site.getCoordinate()));
        try {
            ConformingDelaunayTriangulator triangulator = new ConformingDelaunayTriangulator(
                    InsertionOrder.brio(sites, INSERTION_SEED), mergeTolerance(input));
            triangulator.setConstraints(segments, InsertionOrder.brio(segmentVertices, INSERTION_SEED));
            triangulator.formInitialDelaunay();
            triangulator.enforceConstraints();
            return fromTriangles(triangulator.getSubdivision().getTriangleCoordinates(false), inputDepths,
                    contourSegments);
        } catch (ConstraintEnforcementException | LocateFailureException failure) {
            throw new IllegalArgumentException("the data could not be triangulated (" + failure.getMessage()
                    + "); look for nearly coincident points near the place named, or grid by minimum curvature",
                    failure);
        }
    }

    /** Points closer than a millionth of the data extent are merged (JTS site tolerance). */
    private static double mergeTolerance(GriddingInput input) {
        Envelope extent = new Envelope();
        for (XyzPoint p : input.points()) {
            extent.expandToInclude(p.x(), p.y());
        }
        for (ContourLine contour : input.contours()) {
            extent.expandToInclude(contour.line().getEnvelopeInternal());
        }
        return 1e-6 * Math.max(1.0, Math.max(extent.getWidth(), extent.getHeight()));
    }

    /** {@code triangles}: JTS's raw list of closed 4-point rings. */
    private static TinMesh fromTriangles(List<?> triangles, Map<Coordinate, Double> inputDepths,
            STRtree contourSegments) {
        Map<Coordinate, Integer> vertexIndex = new HashMap<>();
        List<Coordinate> vertices = new ArrayList<>();
        int[] corners = new int[3 * triangles.size()];
        for (int t = 0; t < triangles.size(); t++) {
            for (int c = 0; c < 3; c++) {
                Coordinate p = ((Coordinate[]) triangles.get(t))[c];
                Integer index = vertexIndex.get(p);
                if (index == null) {
                    index = vertices.size();
                    vertexIndex.put(p, index);
                    vertices.add(p);
                }
                corners[3 * t + c] = index;
            }
        }
        int n = vertices.size();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] z = new double[n];
        List<List<Integer>> trianglesAtVertex = new ArrayList<>();
        for (int v = 0; v < n; v++) {
            Coordinate p = vertices.get(v);
            x[v] = p.x;
            y[v] = p.y;
            Double given = inputDepths.get(p);
            z[v] = given != null ? given : depthOfNearestContour(p, contourSegments);
            trianglesAtVertex.add(new ArrayList<>());
        }
        for (int k = 0; k < corners.length; k++) {
            trianglesAtVertex.get(corners[k]).add(k / 3);
        }
        return new TinMesh(x, y, z, corners, trianglesAtVertex);
    }

    private static double depthOfNearestContour(Coordinate p, STRtree contourSegments) {
        DepthSegment nearest = (DepthSegment) contourSegments.nearestNeighbour(new Envelope(p),
                new DepthSegment(new LineSegment(p, p), Double.NaN),
                (a, b) -> ((DepthSegment) a.getItem()).segment().distance(((DepthSegment) b.getItem()).segment()));
        return nearest.z();
    }

    /** A contour segment and its depth, for the depth of points JTS inserts on it. */
    private record DepthSegment(LineSegment segment, double z) {
    }

    int triangleCount() {
        return corners.length / 3;
    }

    /** Vertex index of corner {@code c} (0..2) of triangle {@code t}. */
    int corner(int t, int c) {
        return corners[3 * t + c];
    }

    double x(int vertex) {
        return x[vertex];
    }

    double y(int vertex) {
        return y[vertex];
    }

    double z(int vertex) {
        return z[vertex];
    }

    List<Integer> trianglesAt(int vertex) {
        return trianglesAtVertex.get(vertex);
    }

    /**
     * Barycentric weights of (px, py) in triangle {@code t}; negative weights mean the point is outside and the
     * weights then extrapolate the triangle's plane. Null for a degenerate (zero-area) triangle.
     */
    double[] weights(int t, double px, double py) {
        int a = corner(t, 0);
        int b = corner(t, 1);
        int c = corner(t, 2);
        double det = (y[b] - y[c]) * (x[a] - x[c]) + (x[c] - x[b]) * (y[a] - y[c]);
        if (det == 0) {
            return null;
        }
        double wa = ((y[b] - y[c]) * (px - x[c]) + (x[c] - x[b]) * (py - y[c])) / det;
        double wb = ((y[c] - y[a]) * (px - x[c]) + (x[a] - x[c]) * (py - y[c])) / det;
        return new double[] { wa, wb, 1 - wa - wb };
    }

    /** Depth of the plane of triangle {@code t} for the given weights. */
    double planeDepth(int t, double[] weights) {
        return weights[0] * z[corner(t, 0)] + weights[1] * z[corner(t, 1)] + weights[2] * z[corner(t, 2)];
    }

    /** Map envelope of triangle {@code t}. */
    Envelope envelope(int t) {
        Envelope e = new Envelope();
        for (int c = 0; c < 3; c++) {
            e.expandToInclude(x[corner(t, c)], y[corner(t, c)]);
        }
        return e;
    }

    /**
     * Smallest and largest x where the horizontal line at {@code row} meets triangle {@code t} (its edges and
     * corners); a row just beyond the triangle is moved onto its top or bottom corner.
     */
    double[] span(int t, double row) {
        double bottom = Math.min(y[corner(t, 0)], Math.min(y[corner(t, 1)], y[corner(t, 2)]));
        double top = Math.max(y[corner(t, 0)], Math.max(y[corner(t, 1)], y[corner(t, 2)]));
        double py = Math.min(top, Math.max(bottom, row));
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < 3; c++) {
            int p = corner(t, c);
            int q = corner(t, (c + 1) % 3);
            if (py < Math.min(y[p], y[q]) || py > Math.max(y[p], y[q])) {
                continue;
            }
            if (y[p] == y[q]) {
                low = Math.min(low, Math.min(x[p], x[q]));
                high = Math.max(high, Math.max(x[p], x[q]));
            } else {
                double along = x[p] + (py - y[p]) * (x[q] - x[p]) / (y[q] - y[p]);
                low = Math.min(low, along);
                high = Math.max(high, along);
            }
        }
        return new double[] { low, high };
    }

    /** Triangle {@code t} as a closed coordinate ring, for barrier tests. */
    Coordinate[] ring(int t) {
        Coordinate[] ring = new Coordinate[4];
        for (int c = 0; c < 3; c++) {
            ring[c] = new Coordinate(x[corner(t, c)], y[corner(t, c)]);
        }
        ring[3] = ring[0];
        return ring;
    }
}
