package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.digitize.gridding.ContourLine;
import org.faultbench.digitize.gridding.FaultBarriers;
import org.faultbench.digitize.gridding.GriddingInput;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.io.XyzPoint;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * Builds the input of a gridder for one horizon straight from a digitized sheet: the horizon's contours, its well
 * tops as control points, every fault trace (traces carry no horizon) and the horizon's fault polygons as barriers,
 * and the user's grid. Run {@link TopologyChecker} first: the gridders refuse crossing contours, and an open fault
 * polygon is closed here by returning to its first point.
 */
public final class SheetGriddingInput {

    private SheetGriddingInput() {
    }

    public static GriddingInput forHorizon(MapSheet sheet, String horizon, GridGeometry target) {
        SheetGeometry.required(sheet, "map sheet");
        String name = SheetGeometry.name(horizon, "horizon to grid");
        SheetGeometry.required(target, "grid geometry for " + name);
        List<ContourLine> contours = new ArrayList<>();
        for (ContourFeature contour : sheet.features(ContourFeature.class)) {
            if (contour.horizon().equals(name)) {
                contours.add(new ContourLine(contour.line(), contour.depth()));
            }
        }
        List<XyzPoint> tops = new ArrayList<>();
        for (WellFeature well : sheet.features(WellFeature.class)) {
            for (WellTop top : well.topsOn(name)) {
                tops.add(new XyzPoint(top.x(), top.y(), top.tvdss()));
            }
        }
        if (contours.isEmpty() && tops.isEmpty()) {
            throw new IllegalArgumentException("horizon '" + name + "' has no contours and no well tops to grid");
        }
        return new GriddingInput(tops, contours, barriers(sheet, name), target);
    }

    private static FaultBarriers barriers(MapSheet sheet, String horizon) {
        List<LineString> traces = new ArrayList<>();
        for (FaultTraceFeature trace : sheet.features(FaultTraceFeature.class)) {
            traces.add(trace.trace());
        }
        List<Polygon> polygons = new ArrayList<>();
        for (FaultPolygonFeature polygon : sheet.features(FaultPolygonFeature.class)) {
            if (polygon.horizon().equals(horizon)) {
                polygons.add(polygon.heaveZone());
            }
        }
        return FaultBarriers.of(traces, polygons);
    }
}
