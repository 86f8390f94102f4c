package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.TraceSide;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.sketch.WellFeature;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

class MapSheetFileFormatTest {
    private static final GeometryFactory GEOMETRY = new GeometryFactory();
    private final MapSheetFileFormat format = new MapSheetFileFormat();

    static LineString line(double... xy) {
        Coordinate[] points = new Coordinate[xy.length / 2];
        for (int k = 0; k < points.length; k++) {
            points[k] = new Coordinate(xy[2 * k], xy[2 * k + 1]);
        }
        return GEOMETRY.createLineString(points);
    }

    /** One feature of every kind, with awkward numbers (fractions that are not exact in binary, negatives). */
    static MapSheetFile sample() {
        MapSheet sheet = new MapSheet();
        sheet.add(new ContourFeature(sheet.nextId(), "Top A", 1512.1, line(0.1, 0.2, 100.3, -50.7, 200, 10)));
        sheet.add(new FaultTraceFeature(sheet.nextId(), "F1", line(50, -100, 60, 300), TraceSide.RIGHT));
        sheet.add(new FaultPolygonFeature(sheet.nextId(), "F1", "Top A", line(50, 0, 70, 0, 60, 100, 50, 0)));
        sheet.add(new CutOffFeature(sheet.nextId(), "F1", "Top A", Wall.HANGING_WALL, line(70, 0, 62, 100)));
        sheet.add(new MarkerFeature(sheet.nextId(), MarkerKind.SPILL, 120.5, 80.25, "Top A", "saddle"));
        sheet.add(new WellFeature(sheet.nextId(), "W-1", 10, 20, List.of(
                new WellTop("W-1", "Top A", 10, 20, 1500.5, 1530.25),
                new WellTop("W-1", "Top B", 10.5, 20.5, 1600, Double.NaN))));
        List<ControlPoint> points = List.of(ControlPoint.of("CP1", 10.5, 20.25, 1000, 2000),
                new ControlPoint("CP2", 900, 15, 3000, 2000, false));
        return new MapSheetFile(Optional.of("maps/scan.png"), TransformKind.POLYNOMIAL_2, points, sheet);
    }

    @Test
    void everyFeatureKindRoundTripsWithItsIdAndOrder() throws StudyFormatException {
        MapSheetFile original = sample();
        MapSheetFile read = format.read(format.write(original), "s.json");
        assertEquals(original.image(), read.image());
        assertEquals(original.transform(), read.transform());
        assertEquals(original.controlPoints(), read.controlPoints());
        assertEquals(original.sheet().features().size(), read.sheet().features().size());
        for (int i = 0; i < original.sheet().features().size(); i++) {
            var a = original.sheet().features().get(i);
            var b = read.sheet().features().get(i);
            assertEquals(a.id(), b.id());
            assertEquals(a.getClass(), b.getClass());
            assertTrue(a.geometry().equalsExact(b.geometry()), a.describe());
            if (!(a instanceof ContourFeature || a instanceof FaultTraceFeature || a instanceof FaultPolygonFeature
                    || a instanceof CutOffFeature)) {
                assertEquals(a, b, "value records compare all fields");
            }
        }
        ContourFeature contour = read.sheet().features(ContourFeature.class).get(0);
        assertEquals(1512.1, contour.depth());
        assertEquals(TraceSide.RIGHT, read.sheet().features(FaultTraceFeature.class).get(0).hangingWallSide());
        assertEquals(Wall.HANGING_WALL, read.sheet().features(CutOffFeature.class).get(0).wall());
    }

    @Test
    void nextIdAfterReadingDoesNotReuseAnId() throws StudyFormatException {
        MapSheetFile read = format.read(format.write(sample()), "s.json");
        assertEquals(7, read.sheet().nextId().value());
    }

    @Test
    void featureRejectedByItsConstructorIsReportedAtItsPath() {
        String json = "{\"format\":\"faultbench-mapsheet\",\"schemaVersion\":1,"
                + "\"georeference\":{\"transform\":\"affine\",\"controlPoints\":[]},"
                + "\"features\":[{\"type\":\"faultPolygon\",\"id\":1,\"fault\":\"F\",\"horizon\":\"H\","
                + "\"line\":[[0,0],[1,1]]}]}";
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> format.read(json.getBytes(StandardCharsets.UTF_8), "s.json"));
        assertEquals("features[0]", e.field());
        assertTrue(e.getMessage().contains("3 corners"), e.getMessage());
    }

    @Test
    void duplicateIdIsReported() {
        String feature = "{\"type\":\"marker\",\"id\":4,\"kind\":\"crest\",\"horizon\":\"H\",\"x\":1,\"y\":2}";
        String json = "{\"format\":\"faultbench-mapsheet\",\"schemaVersion\":1,"
                + "\"georeference\":{\"transform\":\"affine\",\"controlPoints\":[]},"
                + "\"features\":[" + feature + "," + feature + "]}";
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> format.read(json.getBytes(StandardCharsets.UTF_8), "s.json"));
        assertEquals("features[1].id", e.field());
    }

    @Test
    void infiniteCoordinateIsReportedAtItsPath() {
        String json = "{\"format\":\"faultbench-mapsheet\",\"schemaVersion\":1,"
                + "\"georeference\":{\"transform\":\"affine\",\"controlPoints\":"
                + "[{\"id\":\"A\",\"col\":1,\"row\":Infinity,\"x\":0,\"y\":0}]},\"features\":[]}";
        StudyFormatException e = assertThrows(StudyFormatException.class,
                () -> format.read(json.getBytes(StandardCharsets.UTF_8), "s.json"));
        assertEquals("georeference.controlPoints[0].row", e.field());
    }
}
