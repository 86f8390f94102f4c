package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

import org.faultbench.core.grid.Barriers;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.IntersectionMatrix;
import org.locationtech.jts.geom.LineSegment;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Faults that a surface may not be interpolated across: fault traces (lines) and fault polygons (the heave gap
 * between footwall and hanging-wall cut-offs), in map metres.
 * <p>
 * Rules: a straight path is blocked by a trace when it touches or crosses it, so a point lying exactly on a trace
 * belongs to neither side; it is blocked by a polygon when it enters the polygon's interior, so data digitised on the
 * polygon outline still serve the side they lie on. Points inside or on a polygon have no surface (null nodes).
 * Trace segments sit in an STR-tree so that each test only looks at nearby segments.
 */
public final class FaultBarriers {
    private static final GeometryFactory FACTORY = new GeometryFactory();
    private static final FaultBarriers NONE = new FaultBarriers(List.of(), List.of());

    private final List<LineString> traces;
    private final List<Polygon> polygons;
    private final List<IndexedPointInAreaLocator> polygonLocators = new ArrayList<>();
    private final STRtree traceSegments = new STRtree();

    private FaultBarriers(List<LineString> traces, List<Polygon> polygons) {
        this.traces = traces;
        this.polygons = polygons;
        for (LineString trace : traces) {
            Coordinate[] points = trace.getCoordinates();
            for (int k = 0; k + 1 < points.length; k++) {
                LineSegment segment = new LineSegment(points[k], points[k + 1]);
                traceSegments.insert(new Envelope(points[k], points[k + 1]), segment);
            }
        }
        traceSegments.build();
        for (Polygon polygon : polygons) {
            polygonLocators.add(new IndexedPointInAreaLocator(polygon));
        }
    }

    /** No faults: every path is open. */
    public static FaultBarriers none() {
        return NONE;
    }

    /** Barriers from fault traces and fault polygons; either list may be empty. */
    public static FaultBarriers of(Collection<? extends LineString> traces, Collection<? extends Polygon> polygons) {
        if (traces == null || polygons == null) {
            throw new IllegalArgumentException("fault traces or fault polygons missing (use an empty list for none)");
        }
        List<LineString> checkedTraces = new ArrayList<>();
        for (LineString trace : traces) {
            checkedTraces.add(requireUsable(trace, "fault trace"));
        }
        List<Polygon> checkedPolygons = new ArrayList<>();
        for (Polygon polygon : polygons) {
            checkedPolygons.add(requireUsable(polygon, "fault polygon"));
        }
        return new FaultBarriers(List.copyOf(checkedTraces), List.copyOf(checkedPolygons));
    }

    private static <T extends Geometry> T requireUsable(T geometry, String what) {
        if (geometry == null || geometry.isEmpty()) {
            throw new IllegalArgumentException("a " + what + " is missing or empty");
        }
        for (Coordinate c : geometry.getCoordinates()) {
            if (!Double.isFinite(c.x) || !Double.isFinite(c.y)) {
                throw new IllegalArgumentException(what + " point must have finite x and y, was (" + c.x + ", " + c.y
                        + ")");
            }
        }
        return geometry;
    }

    /** These barriers plus one more trace, e.g. the fault whose cut-offs are sampled. */
    public FaultBarriers withTrace(LineString trace) {
        List<LineString> more = new ArrayList<>(traces);
        more.add(requireUsable(trace, "fault trace"));
        return new FaultBarriers(List.copyOf(more), polygons);
    }

    public List<LineString> traces() {
        return traces;
    }

    public List<Polygon> polygons() {
        return polygons;
    }

    public boolean isEmpty() {
        return traces.isEmpty() && polygons.isEmpty();
    }

    /** Whether (x, y) lies inside or on a fault polygon, where the horizon is cut out. */
    public boolean isInFaultPolygon(double x, double y) {
        Coordinate point = new Coordinate(x, y);
        for (int k = 0; k < polygons.size(); k++) {
            if (polygons.get(k).getEnvelopeInternal().covers(x, y)
                    && polygonLocators.get(k).locate(point) != Location.EXTERIOR) {
                return true;
            }
        }
        return false;
    }

    /** Whether the straight path from (x1, y1) to (x2, y2) is blocked by a trace or a polygon (rules above). */
    public boolean blocks(double x1, double y1, double x2, double y2) {
        Coordinate a = new Coordinate(x1, y1);
        Coordinate b = new Coordinate(x2, y2);
        Envelope path = new Envelope(a, b);
        return blockedByTrace(a, b, path) || blockedByPolygon(a, b, path);
    }

    private boolean blockedByTrace(Coordinate a, Coordinate b, Envelope path) {
        for (Object candidate : traceSegments.query(path)) {
            LineSegment segment = (LineSegment) candidate;
            if (meet(a, b, segment.p0, segment.p1)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether segments ab and cd share a point, by JTS's robust orientation tests: the test that starts JTS's
     * RobustLineIntersector, without computing the intersection point, which is slow and not needed here.
     */
    private static boolean meet(Coordinate a, Coordinate b, Coordinate c, Coordinate d) {
        if (!Envelope.intersects(a, b, c, d)) {
            return false;
        }
        int cSide = Orientation.index(a, b, c);
        int dSide = Orientation.index(a, b, d);
        if (cSide * dSide > 0) {
            return false;
        }
        int aSide = Orientation.index(c, d, a);
        int bSide = Orientation.index(c, d, b);
        return aSide * bSide <= 0;
    }

    private boolean blockedByPolygon(Coordinate a, Coordinate b, Envelope path) {
        LineString segment = null;
        for (Polygon polygon : polygons) {
            if (!polygon.getEnvelopeInternal().intersects(path)) {
                continue;
            }
            if (segment == null) {
                segment = FACTORY.createLineString(new Coordinate[] { a, b });
            }
            IntersectionMatrix relation = polygon.relate(segment);
            if (relation.get(Location.INTERIOR, Location.INTERIOR) >= 0
                    || relation.get(Location.INTERIOR, Location.BOUNDARY) >= 0) {
                return true;
            }
        }
        return false;
    }

    /** Whether a trace or a polygon touches the closed triangle {@code ring}, so that paths inside it need testing. */
    boolean touchesTriangle(Coordinate[] ring) {
        Envelope area = new Envelope(ring[0], ring[1]);
        area.expandToInclude(ring[2]);
        for (Object candidate : traceSegments.query(area)) {
            LineSegment segment = (LineSegment) candidate;
            if (meetsTriangle(segment, ring)) {
                return true;
            }
        }
        if (polygons.isEmpty()) {
            return false;
        }
        Polygon triangle = FACTORY.createPolygon(ring);
        for (Polygon polygon : polygons) {
            if (polygon.getEnvelopeInternal().intersects(area) && polygon.intersects(triangle)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether a segment shares a point with the closed triangle {@code ring}: it meets an edge or lies inside. The
     * orientation tests of {@link #meet} instead of a JTS polygon predicate, which builds a topology graph per call.
     */
    private static boolean meetsTriangle(LineSegment segment, Coordinate[] ring) {
        for (int c = 0; c < 3; c++) {
            if (meet(segment.p0, segment.p1, ring[c], ring[c + 1])) {
                return true;
            }
        }
        int first = Orientation.index(ring[0], ring[1], segment.p0);
        int second = Orientation.index(ring[1], ring[2], segment.p0);
        int third = Orientation.index(ring[2], ring[0], segment.p0);
        return first != 0 && first == second && second == third;
    }

    /**
     * Nodes whose cell a trace or polygon outline touches ({@link Barriers#rasterize}). A straight path between points
     * of the square spanned by four neighbouring nodes can only be blocked when one of the four is flagged, so the
     * exact test above is needed only there.
     */
    GridMask nearNodes(GridGeometry geometry) {
        if (isEmpty()) {
            return GridMask.none(geometry);
        }
        List<LineString> lines = new ArrayList<>(traces);
        for (Polygon polygon : polygons) {
            lines.add(FACTORY.createLineString(polygon.getExteriorRing().getCoordinateSequence()));
            for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                lines.add(FACTORY.createLineString(polygon.getInteriorRingN(h).getCoordinateSequence()));
            }
        }
        return Barriers.rasterize(geometry, lines);
    }
}
