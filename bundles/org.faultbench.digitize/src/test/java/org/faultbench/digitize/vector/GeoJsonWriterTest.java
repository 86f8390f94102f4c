package org.faultbench.digitize.vector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.digitize.io.FileUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/** GeoJSON writing (IETF RFC 7946), checked by reading back; right-hand rule for rings from RFC 7946 3.1.6. */
class GeoJsonWriterTest {
    private static final GeometryFactory FACTORY = new GeometryFactory();
    private static final double EXACT = 1e-9;

    @TempDir
    Path dir;

    static List<VectorFeature> sampleFeatures() {
        LineString trace = FACTORY.createLineString(
                new Coordinate[] { new Coordinate(1000, 2000, 1800), new Coordinate(1500.25, 2600, 1850.5) });
        // drawn clockwise on purpose, with a counterclockwise hole
        Polygon heave = FACTORY.createPolygon(
                FACTORY.createLinearRing(new Coordinate[] { new Coordinate(0, 0), new Coordinate(0, 100),
                    new Coordinate(100, 100), new Coordinate(100, 0), new Coordinate(0, 0) }),
                new org.locationtech.jts.geom.LinearRing[] { FACTORY.createLinearRing(new Coordinate[] {
                    new Coordinate(40, 40), new Coordinate(60, 40), new Coordinate(60, 60), new Coordinate(40, 60),
                    new Coordinate(40, 40) }) });
        Map<String, Object> traceProperties = new LinkedHashMap<>();
        traceProperties.put("name", "F1");
        traceProperties.put("throw", 45.5);
        traceProperties.put("sealing", true);
        return List.of(new VectorFeature(trace, traceProperties),
                new VectorFeature(FACTORY.createMultiLineString(new LineString[] {
                    FACTORY.createLineString(new Coordinate[] { new Coordinate(0, 0), new Coordinate(10, 0) }),
                    FACTORY.createLineString(new Coordinate[] { new Coordinate(20, 0), new Coordinate(30, 5) }) })),
                new VectorFeature(heave, Map.of("kind", "heave")));
    }

    private static List<VectorFeature> roundTrip(List<VectorFeature> features, FileUnits units) throws IOException {
        StringWriter text = new StringWriter();
        new GeoJsonWriter(units, "EPSG:32631").write(features, text);
        return new GeoJsonReader(units).read(new StringReader(text.toString()), "round.geojson");
    }

    @Test
    void featuresSurviveARoundTrip() throws IOException {
        List<VectorFeature> original = sampleFeatures();
        List<VectorFeature> back = roundTrip(original, FileUnits.METRES);
        assertEquals(original.size(), back.size());
        for (int f = 0; f < original.size(); f++) {
            assertTrue(original.get(f).geometry().equalsTopo(back.get(f).geometry()), "feature " + f);
            Map<String, Object> expected = new LinkedHashMap<>(original.get(f).properties());
            expected.put("crs", "EPSG:32631");
            assertEquals(expected, back.get(f).properties());
        }
        assertEquals(1850.5, back.get(0).geometry().getCoordinates()[1].getZ(), EXACT);
        assertTrue(original.get(0).geometry().equalsExact(back.get(0).geometry()), "lines keep their vertex order");
    }

    @Test
    void ringsFollowTheRightHandRule() throws IOException {
        Polygon written = (Polygon) roundTrip(sampleFeatures(), FileUnits.METRES).get(2).geometry();
        // RFC 7946 3.1.6: exterior rings counterclockwise, holes clockwise
        assertTrue(Orientation.isCCW(written.getExteriorRing().getCoordinates()));
        assertFalse(Orientation.isCCW(written.getInteriorRingN(0).getCoordinates()));
        Polygon original = (Polygon) sampleFeatures().get(2).geometry();
        assertFalse(Orientation.isCCW(original.getExteriorRing().getCoordinates()), "the input was not modified");
    }

    @Test
    void coordinatesAreWrittenInTheDeclaredUnits() throws IOException {
        VectorFeature line = new VectorFeature(FACTORY.createLineString(
                new Coordinate[] { new Coordinate(304.8, 0, 1524), new Coordinate(0, 0, 0) }));
        StringWriter text = new StringWriter();
        new GeoJsonWriter(FileUnits.of(LengthUnit.FOOT), "").write(List.of(line), text);
        // 304.8 m = 1000 ft, 1524 m = 5000 ft; no crs note when none is given
        assertTrue(text.toString().contains("1000.0"), text.toString());
        assertTrue(text.toString().contains("5000.0"), text.toString());
        assertFalse(text.toString().contains("crs"), text.toString());
    }

    @Test
    void existingCrsPropertyIsKeptAndFilesAreWritten() throws IOException {
        VectorFeature own = new VectorFeature(sampleFeatures().get(1).geometry(), Map.of("crs", "local grid"));
        Path file = dir.resolve("out.geojson");
        new GeoJsonWriter(FileUnits.METRES, "EPSG:32631").write(List.of(own), file);
        List<VectorFeature> back = new GeoJsonReader(FileUnits.METRES).read(file);
        assertEquals(Map.of("crs", "local grid"), back.get(0).properties());
    }
}
