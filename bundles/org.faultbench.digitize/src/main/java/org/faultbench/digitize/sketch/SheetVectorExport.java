package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.digitize.vector.VectorFeature;

/**
 * The line and polygon features of a sheet as {@link VectorFeature}s for the GeoJSON and WKT writers: contours,
 * fault traces, fault polygons (closed) and cut-offs, each with a "layer" property saying which, its sheet id and its
 * attributes. Markers and wells are points, which those formats are not used for here, so they are left out.
 */
public final class SheetVectorExport {
    public static final String LAYER = "layer";

    private SheetVectorExport() {
    }

    /** The exportable features of {@code sheet}, in drawing order. */
    public static List<VectorFeature> features(MapSheet sheet) {
        List<VectorFeature> exported = new ArrayList<>();
        for (SheetFeature feature : SheetGeometry.required(sheet, "map sheet").features()) {
            Map<String, Object> properties = new LinkedHashMap<>();
            properties.put("id", feature.id().value());
            if (feature instanceof ContourFeature contour) {
                exported.add(contour(contour, properties));
            } else if (feature instanceof FaultTraceFeature trace) {
                exported.add(trace(trace, properties));
            } else if (feature instanceof FaultPolygonFeature polygon) {
                exported.add(polygon(polygon, properties));
            } else if (feature instanceof CutOffFeature cutOff) {
                exported.add(cutOff(cutOff, properties));
            }
        }
        return exported;
    }

    private static VectorFeature contour(ContourFeature contour, Map<String, Object> properties) {
        properties.put(LAYER, "contour");
        properties.put("horizon", contour.horizon());
        properties.put("depth", contour.depth());
        return new VectorFeature(contour.line(), properties);
    }

    private static VectorFeature trace(FaultTraceFeature trace, Map<String, Object> properties) {
        properties.put(LAYER, "fault trace");
        properties.put("fault", trace.fault());
        properties.put("hangingWallSide", trace.hangingWallSide().name());
        return new VectorFeature(trace.trace(), properties);
    }

    private static VectorFeature polygon(FaultPolygonFeature polygon, Map<String, Object> properties) {
        properties.put(LAYER, "fault polygon");
        properties.put("fault", polygon.fault());
        properties.put("horizon", polygon.horizon());
        return new VectorFeature(polygon.heaveZone(), properties);
    }

    private static VectorFeature cutOff(CutOffFeature cutOff, Map<String, Object> properties) {
        properties.put(LAYER, "cut-off");
        properties.put("fault", cutOff.fault());
        properties.put("horizon", cutOff.horizon());
        properties.put("wall", cutOff.wall().name());
        return new VectorFeature(cutOff.line(), properties);
    }
}
