package org.faultbench.digitize.gridding;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;

/**
 * A digitised depth contour: a map polyline (metres) along which the horizon lies at one depth.
 *
 * @param line the contour in map x, y, metres; any z on its points is ignored
 * @param z depth of the contour, metres, positive downward
 */
public record ContourLine(LineString line, double z) {

    public ContourLine {
        if (line == null || line.isEmpty()) {
            throw new IllegalArgumentException("contour line is missing or empty");
        }
        if (!Double.isFinite(z)) {
            throw new IllegalArgumentException("contour depth must be a finite number, was " + z);
        }
        for (Coordinate c : line.getCoordinates()) {
            if (!Double.isFinite(c.x) || !Double.isFinite(c.y)) {
                throw new IllegalArgumentException("contour " + z + " m: point must have finite x and y, was (" + c.x
                        + ", " + c.y + ")");
            }
        }
    }
}
