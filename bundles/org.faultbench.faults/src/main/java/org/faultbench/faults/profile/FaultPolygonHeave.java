package org.faultbench.faults.profile;

import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

/**
 * Heave read from a mapped fault polygon (the gap a horizon map leaves between its footwall and hanging-wall
 * cut-offs): at a station along strike, the width of the polygon measured perpendicular to the trace. Measured heave
 * is preferred over {@link DipSlip#heave} wherever polygons exist, because it needs no assumed dip.
 */
public final class FaultPolygonHeave {

    private final Fault fault;
    private final Polygon polygon;
    private final double reach;

    /** @param polygon the horizon's fault polygon in map coordinates; must be valid and non-empty */
    public FaultPolygonHeave(Fault fault, Polygon polygon) {
        if (polygon == null || polygon.isEmpty() || !polygon.isValid()) {
            throw new IllegalArgumentException("fault '" + fault.name() + "': fault polygon is missing, empty or"
                    + " self-intersecting");
        }
        this.fault = fault;
        this.polygon = polygon;
        Envelope both = new Envelope(polygon.getEnvelopeInternal());
        both.expandToInclude(fault.trace().getEnvelopeInternal());
        this.reach = Math.hypot(both.getWidth(), both.getHeight());
    }

    /**
     * Heave (m) at along-strike distance {@code u}: the length of the polygon piece, nearest to the trace, on the
     * line through the trace point perpendicular to the trace; NaN where that line misses the polygon.
     */
    public double heaveAt(double u) {
        Coordinate onTrace = fault.positionAt(u);
        GeometryFactory factory = polygon.getFactory();
        LineString normal = factory.createLineString(new Coordinate[] {
            fault.positionAt(u, Wall.FOOTWALL, reach), fault.positionAt(u, Wall.HANGING_WALL, reach)});
        Geometry cut = polygon.intersection(normal);
        Point tracePoint = factory.createPoint(onTrace);
        double heave = Double.NaN;
        double nearest = Double.POSITIVE_INFINITY;
        for (int i = 0; i < cut.getNumGeometries(); i++) {
            Geometry piece = cut.getGeometryN(i);
            double distance = piece.distance(tracePoint);
            if (piece.getLength() > 0 && distance < nearest) {
                nearest = distance;
                heave = piece.getLength();
            }
        }
        return heave;
    }
}
