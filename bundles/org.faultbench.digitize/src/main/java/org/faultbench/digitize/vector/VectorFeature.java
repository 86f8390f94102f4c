package org.faultbench.digitize.vector;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.locationtech.jts.geom.Geometry;

/**
 * A map line or polygon with attributes, as exchanged in GeoJSON and WKT files: fault traces, fault polygons,
 * contours, lease or closure outlines. Coordinates are projected map metres (x east, y north), z in metres.
 *
 * @param geometry a LineString, MultiLineString or Polygon ({@link FeatureGeometry#SUPPORTED})
 * @param properties attribute values by name, in file order: text ({@code String}), numbers ({@code Double}) or
 *        {@code Boolean}; copied and unmodifiable
 */
public record VectorFeature(Geometry geometry, Map<String, Object> properties) {

    public VectorFeature {
        if (geometry == null || properties == null) {
            throw new IllegalArgumentException("feature needs a geometry and properties (may be empty)");
        }
        FeatureGeometry.requireSupported(geometry);
        if (geometry.isEmpty()) {
            throw new IllegalArgumentException("feature geometry is empty");
        }
        Map<String, Object> copy = new LinkedHashMap<>();
        for (Map.Entry<String, Object> property : properties.entrySet()) {
            copy.put(checkedName(property.getKey()), checkedValue(property.getKey(), property.getValue()));
        }
        properties = Collections.unmodifiableMap(copy);
    }

    /** A feature without attributes. */
    public VectorFeature(Geometry geometry) {
        this(geometry, Map.of());
    }

    private static String checkedName(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("feature property name is empty");
        }
        return name;
    }

    private static Object checkedValue(String name, Object value) {
        if (value instanceof String || value instanceof Boolean) {
            return value;
        }
        if (value instanceof Number number && Double.isFinite(number.doubleValue())) {
            return number.doubleValue();
        }
        throw new IllegalArgumentException("feature property '" + name + "' must be text, a finite number or "
                + "true/false, was " + value);
    }
}
