package org.faultbench.digitize.vector;

import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.faultbench.digitize.io.FileUnits;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateArrays;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

import com.google.gson.stream.JsonWriter;

/**
 * Writes line and polygon features as a GeoJSON FeatureCollection (IETF RFC 7946) with gson. Polygon outer rings
 * are written counterclockwise and holes clockwise (the right-hand rule of RFC 7946 &sect;3.1.6); z is written where
 * a position has one. Coordinates are projected, not the WGS 84 longitude/latitude that RFC 7946 assumes, so each
 * feature gets a "crs" property holding the caller's note (e.g. "EPSG:32631, metres") unless it already has one.
 * Metres are converted to the declared {@link FileUnits}.
 */
public final class GeoJsonWriter {
    static final String CRS_PROPERTY = "crs";

    private final FileUnits units;
    private final String crsNote;

    /**
     * @param units units to write coordinates in
     * @param crsNote the projected coordinate system, e.g. an EPSG code; blank for no note
     */
    public GeoJsonWriter(FileUnits units, String crsNote) {
        if (units == null || crsNote == null) {
            throw new IllegalArgumentException("file units or coordinate-system note missing (use \"\" for none)");
        }
        this.units = units;
        this.crsNote = crsNote.strip();
    }

    /** Writes {@code features} to {@code file}, replacing it only once the whole text is ready. */
    public void write(List<VectorFeature> features, Path file) throws IOException {
        StringWriter text = new StringWriter();
        write(features, text);
        Files.writeString(file, text.toString(), StandardCharsets.UTF_8);
    }

    public void write(List<VectorFeature> features, Writer out) throws IOException {
        if (features == null) {
            throw new IllegalArgumentException("feature list missing");
        }
        JsonWriter json = new JsonWriter(out);
        json.setIndent("  ");
        json.beginObject().name("type").value("FeatureCollection").name("features").beginArray();
        for (VectorFeature feature : features) {
            writeFeature(json, feature);
        }
        json.endArray().endObject();
        json.flush();
    }

    private void writeFeature(JsonWriter json, VectorFeature feature) throws IOException {
        json.beginObject().name("type").value("Feature").name("geometry");
        writeGeometry(json, feature.geometry());
        json.name("properties").beginObject();
        for (Map.Entry<String, Object> property : feature.properties().entrySet()) {
            json.name(property.getKey());
            Object value = property.getValue();
            if (value instanceof String text) {
                json.value(text);
            } else if (value instanceof Boolean flag) {
                json.value(flag);
            } else {
                json.value((Double) value);
            }
        }
        if (!crsNote.isEmpty() && !feature.properties().containsKey(CRS_PROPERTY)) {
            json.name(CRS_PROPERTY).value(crsNote);
        }
        json.endObject().endObject();
    }

    private void writeGeometry(JsonWriter json, Geometry geometry) throws IOException {
        json.beginObject().name("type").value(geometry.getGeometryType()).name("coordinates");
        if (geometry instanceof Polygon polygon) {
            json.beginArray();
            writePositions(json, oriented(polygon.getExteriorRing(), true));
            for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                writePositions(json, oriented(polygon.getInteriorRingN(h), false));
            }
            json.endArray();
        } else if (geometry instanceof LineString line) {
            writePositions(json, line.getCoordinates());
        } else {
            json.beginArray();
            for (int part = 0; part < geometry.getNumGeometries(); part++) {
                writePositions(json, geometry.getGeometryN(part).getCoordinates());
            }
            json.endArray();
        }
        json.endObject();
    }

    /** Ring coordinates turned counterclockwise ({@code counterclockwise}) or clockwise. */
    private static Coordinate[] oriented(LineString ring, boolean counterclockwise) {
        Coordinate[] points = ring.getCoordinates().clone();
        if (Orientation.isCCW(points) != counterclockwise) {
            CoordinateArrays.reverse(points);
        }
        return points;
    }

    private void writePositions(JsonWriter json, Coordinate[] points) throws IOException {
        json.beginArray();
        for (Coordinate p : points) {
            json.beginArray().value(units.xy().fromMetres(p.x)).value(units.xy().fromMetres(p.y));
            if (!Double.isNaN(p.getZ())) {
                json.value(units.z().fromMetres(p.getZ()));
            }
            json.endArray();
        }
        json.endArray();
    }
}
