package org.faultbench.digitize.sketch;

import org.locationtech.jts.geom.LineString;

/**
 * A digitized depth contour of one horizon.
 *
 * @param id identity on the sheet
 * @param horizon horizon name
 * @param depth contour value, metres, positive downward
 * @param line the contour in map metres (copied)
 */
public record ContourFeature(FeatureId id, String horizon, double depth, LineString line) implements SheetFeature {

    public ContourFeature {
        SheetGeometry.required(id, "contour id");
        horizon = SheetGeometry.name(horizon, "contour horizon name");
        if (!Double.isFinite(depth)) {
            throw new IllegalArgumentException("contour depth must be a finite number, was " + depth);
        }
        line = SheetGeometry.line(line, "contour " + SheetGeometry.number(depth) + " m");
    }

    @Override
    public LineString geometry() {
        return line;
    }

    @Override
    public String describe() {
        return "contour " + SheetGeometry.number(depth) + " m on " + horizon;
    }
}
