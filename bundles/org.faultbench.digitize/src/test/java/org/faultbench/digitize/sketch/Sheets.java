package org.faultbench.digitize.sketch;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;

/** Invented test features; map metres, depth positive downward. */
final class Sheets {
    static final String HORIZON = "Top A";

    private Sheets() {
    }

    /** A line through the points given as x1, y1, x2, y2, ... */
    static LineString line(double... xy) {
        Coordinate[] points = new Coordinate[xy.length / 2];
        for (int k = 0; k < points.length; k++) {
            points[k] = new Coordinate(xy[2 * k], xy[2 * k + 1]);
        }
        return SheetGeometry.FACTORY.createLineString(points);
    }

    static ContourFeature contour(MapSheet sheet, double depth, double... xy) {
        ContourFeature contour = new ContourFeature(sheet.nextId(), HORIZON, depth, line(xy));
        sheet.add(contour);
        return contour;
    }

    static FaultTraceFeature trace(MapSheet sheet, TraceSide hangingWall, double... xy) {
        FaultTraceFeature trace = new FaultTraceFeature(sheet.nextId(), "F1", line(xy), hangingWall);
        sheet.add(trace);
        return trace;
    }

    static FaultPolygonFeature polygon(MapSheet sheet, double... xy) {
        FaultPolygonFeature polygon = new FaultPolygonFeature(sheet.nextId(), "F1", HORIZON, line(xy));
        sheet.add(polygon);
        return polygon;
    }

    static CutOffFeature cutOff(MapSheet sheet, Wall wall, double... xy) {
        CutOffFeature cutOff = new CutOffFeature(sheet.nextId(), "F1", HORIZON, wall, line(xy));
        sheet.add(cutOff);
        return cutOff;
    }
}
