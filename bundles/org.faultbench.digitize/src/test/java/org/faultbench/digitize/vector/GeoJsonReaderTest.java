package org.faultbench.digitize.vector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/**
 * GeoJSON reading (IETF RFC 7946: FeatureCollection, Feature, LineString/MultiLineString/Polygon coordinates as
 * arrays of positions, polygon rings closed with at least 4 positions, section 3.1.6). Hand-made files; the crs
 * property is Faultbench's note for projected coordinates.
 */
class GeoJsonReaderTest {
    private static final double EXACT = 1e-9;

    static final String SAMPLE = """
            {"type": "FeatureCollection", "features": [
              {"type": "Feature",
               "geometry": {"type": "LineString", "coordinates": [[1000, 2000], [1500.5, 2600, 1810]]},
               "properties": {"name": "F1", "throw": 45.5, "sealing": true, "note": null, "crs": "EPSG:32631"}},
              {"type": "Feature",
               "geometry": {"type": "MultiLineString", "coordinates": [[[0, 0], [10, 0]], [[20, 0], [30, 5]]]},
               "properties": null},
              {"type": "Feature",
               "geometry": {"type": "Polygon", "coordinates": [
                 [[0, 0], [100, 0], [100, 100], [0, 100], [0, 0]],
                 [[40, 40], [40, 60], [60, 60], [60, 40], [40, 40]]]},
               "properties": {"kind": "heave"}}
            ]}
            """;

    @TempDir
    Path dir;

    private static List<VectorFeature> read(String text) throws IOException {
        return new GeoJsonReader(FileUnits.METRES).read(new StringReader(text), "faults.geojson");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void featureCollectionIsRead() throws IOException {
        Path file = dir.resolve("faults.geojson");
        Files.writeString(file, SAMPLE);
        List<VectorFeature> features = new GeoJsonReader(FileUnits.METRES).read(file);
        assertEquals(3, features.size());
        Geometry trace = features.get(0).geometry();
        assertEquals(Geometry.TYPENAME_LINESTRING, trace.getGeometryType());
        assertEquals(1500.5, trace.getCoordinates()[1].x, EXACT);
        assertEquals(1810, trace.getCoordinates()[1].getZ(), EXACT);
        assertTrue(Double.isNaN(trace.getCoordinates()[0].getZ()), "2-number position has no z");
        assertEquals(Map.of("name", "F1", "throw", 45.5, "sealing", true, "crs", "EPSG:32631"),
                features.get(0).properties(), "null property left out");
        assertEquals(2, features.get(1).geometry().getNumGeometries());
        assertTrue(features.get(1).properties().isEmpty());
        Polygon heave = (Polygon) features.get(2).geometry();
        assertEquals(1, heave.getNumInteriorRing());
        // 100 x 100 square minus a 20 x 20 hole: 9600 m2 (hand calculation)
        assertEquals(9600, heave.getArea(), EXACT);
    }

    @Test
    void singleFeatureDocumentIsRead() throws IOException {
        List<VectorFeature> features = read("""
                {"type": "Feature", "properties": {},
                 "geometry": {"coordinates": [[1, 2], [3, 4]], "type": "LineString"}}""");
        assertEquals(1, features.size());
        assertEquals(4, features.get(0).geometry().getCoordinates()[1].y, EXACT);
    }

    @Test
    void declaredFeetAreConvertedToMetres() throws IOException {
        List<VectorFeature> features = new GeoJsonReader(FileUnits.of(LengthUnit.FOOT)).read(new StringReader("""
                {"type": "Feature", "properties": {},
                 "geometry": {"type": "LineString", "coordinates": [[1000, 0, 5000], [0, 1, 0]]}}"""), "ft.json");
        // 1000 ft = 304.8 m, 5000 ft = 1524 m (1 ft = 0.3048 m exactly; from memory)
        assertEquals(304.8, features.get(0).geometry().getCoordinates()[0].x, EXACT);
        assertEquals(1524, features.get(0).geometry().getCoordinates()[0].getZ(), EXACT);
    }

    @Test
    void syntaxErrorNamesLineAndColumn() {
        FormatException e = failure("""
                {"type": "Feature",
                 "geometry": {"type": "LineString" "coordinates": []}}""");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().startsWith("faults.geojson, line 2: at column "), e.getMessage());
        assertTrue(e.getMessage().contains("not valid JSON"), e.getMessage());
        FormatException cut = failure("{\"type\": \"Feature\", \"geometry\": {\"type\": \"LineString\", ");
        assertTrue(cut.getMessage().contains("ends too early"), cut.getMessage());
    }

    @Test
    void unsupportedGeometryIsReportedAtItsType() {
        FormatException e = failure("""
                {"type": "FeatureCollection", "features": [
                  {"type": "Feature", "properties": {},
                   "geometry": {"type": "Point", "coordinates": [1, 2]}}]}""");
        // "Point" starts at column 25 of line 3
        assertEquals("faults.geojson, line 3: at column 25 ($.features[0].geometry.type), geometry type 'Point' is "
                + "not read or written here; expected LineString, MultiLineString or Polygon", e.getMessage());
    }

    @Test
    void badPositionsAreReportedWhereTheyStart() {
        FormatException shortPosition = failure(SAMPLE.replace("[1500.5, 2600, 1810]", "[1500.5]"));
        assertEquals(3, shortPosition.line());
        // the position array starts at column 69 of line 3
        assertTrue(shortPosition.getMessage().contains("at column 69 ("), shortPosition.getMessage());
        assertTrue(shortPosition.getMessage().contains("2 or 3 numbers"), shortPosition.getMessage());
        FormatException text = failure(SAMPLE.replace("[[1000, 2000]", "[[\"1000\", 2000]"));
        // the string "1000" starts at column 56
        assertTrue(text.getMessage().contains("at column 56 ("), text.getMessage());
        assertTrue(text.getMessage().contains("x must be a number"), text.getMessage());
        FormatException open = failure(SAMPLE.replace("[0, 100], [0, 0]],", "[0, 100], [0, 1]],"));
        assertEquals(10, open.line());
        assertTrue(open.getMessage().contains("must end where it starts"), open.getMessage());
    }

    @Test
    void structureErrorsAreReported() {
        FormatException noGeometry = failure("{\"type\": \"Feature\", \"properties\": {}}");
        assertEquals("faults.geojson, line 1: at column 1 ($), member 'geometry' is missing", noGeometry.getMessage());
        FormatException nested = failure(SAMPLE.replace("\"kind\": \"heave\"", "\"kind\": {\"a\": 1}"));
        assertTrue(nested.getMessage().contains("property 'kind' is an object or array"), nested.getMessage());
        FormatException wrongType = failure("{\"type\": \"Topology\"}");
        assertTrue(wrongType.getMessage().contains("found type 'Topology'"), wrongType.getMessage());
    }

    @Test
    void nonFiniteCoordinatesAreRefused() {
        // NaN and infinity audit (issue #9): an overflowing literal and NaN must not become coordinates
        for (String bad : new String[] {"1e400", "NaN", "-Infinity"}) {
            FormatException e = failure(SAMPLE.replace("[1500.5, 2600, 1810]", "[1500.5, " + bad + ", 1810]"));
            assertEquals(3, e.line(), bad + ": " + e.getMessage());
        }
    }

    @Test
    void emptyCoordinatesAreAFormatError() {
        // found by the long fuzz run (seed 20261202, input 492372): VectorFeature threw IllegalArgumentException
        FormatException e = failure(SAMPLE.replace("\"coordinates\": [[[0, 0], [10, 0]], [[20, 0], [30, 5]]]",
                "\"coordinates\": []"));
        assertEquals(6, e.line());
        assertTrue(e.getMessage().contains("empty"), e.getMessage());
    }
}
