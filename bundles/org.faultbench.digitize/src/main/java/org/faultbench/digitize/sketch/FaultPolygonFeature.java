package org.faultbench.digitize.sketch;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * A digitized fault polygon: the heave zone of a fault on one horizon, between its footwall and hanging-wall
 * cut-offs. The outline is kept as drawn, open or closed, so that the topology check can report an outline the user
 * did not close.
 *
 * @param id identity on the sheet
 * @param fault fault name, as on its trace
 * @param horizon horizon name
 * @param outline the outline in map metres (copied): at least 3 corners, not counting a last point that repeats the
 *        first
 */
public record FaultPolygonFeature(FeatureId id, String fault, String horizon, LineString outline)
        implements SheetFeature {

    public FaultPolygonFeature {
        SheetGeometry.required(id, "fault polygon id");
        fault = SheetGeometry.name(fault, "fault polygon: fault name");
        horizon = SheetGeometry.name(horizon, "fault polygon of " + fault + ": horizon name");
        String what = "fault polygon of " + fault + " on " + horizon;
        outline = SheetGeometry.line(outline, what);
        int corners = outline.getNumPoints() - (outline.isClosed() ? 1 : 0);
        if (corners < 3) {
            throw new IllegalArgumentException(what + " needs at least 3 corners, was " + corners);
        }
    }

    /** Distance from the last digitized point back to the first, metres; 0 for an outline closed exactly. */
    public double closingGap() {
        return outline.getStartPoint().getCoordinate().distance(outline.getEndPoint().getCoordinate());
    }

    /** The heave zone as a polygon, closed by returning to the first point where the outline does not end on it. */
    public Polygon heaveZone() {
        Coordinate[] drawn = outline.getCoordinates();
        if (outline.isClosed()) {
            return SheetGeometry.FACTORY.createPolygon(drawn);
        }
        Coordinate[] ring = new Coordinate[drawn.length + 1];
        System.arraycopy(drawn, 0, ring, 0, drawn.length);
        ring[drawn.length] = drawn[0].copy();
        return SheetGeometry.FACTORY.createPolygon(ring);
    }

    @Override
    public LineString geometry() {
        return outline;
    }

    @Override
    public String describe() {
        return "fault polygon of " + fault + " on " + horizon;
    }
}
