package org.faultbench.digitize.sketch;

import org.locationtech.jts.geom.LineString;

/**
 * A digitized cut-off line: where a horizon meets a fault, on the footwall or the hanging-wall side.
 *
 * @param id identity on the sheet
 * @param fault fault name, as on its trace
 * @param horizon horizon name
 * @param wall the block the cut-off belongs to
 * @param line the cut-off in map metres (copied)
 */
public record CutOffFeature(FeatureId id, String fault, String horizon, Wall wall, LineString line)
        implements SheetFeature {

    public CutOffFeature {
        SheetGeometry.required(id, "cut-off id");
        fault = SheetGeometry.name(fault, "cut-off: fault name");
        horizon = SheetGeometry.name(horizon, "cut-off of " + fault + ": horizon name");
        SheetGeometry.required(wall, "cut-off of " + fault + " on " + horizon + ": wall");
        line = SheetGeometry.line(line, wall.label() + " cut-off of " + fault + " on " + horizon);
    }

    @Override
    public LineString geometry() {
        return line;
    }

    @Override
    public String describe() {
        return wall.label() + " cut-off of " + fault + " on " + horizon;
    }
}
