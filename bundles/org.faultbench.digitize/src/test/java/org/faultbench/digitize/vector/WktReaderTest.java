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

/**
 * WKT reading: geometry text per OGC Simple Features (ISO 19125-1), e.g. LINESTRING (x y, ...), POLYGON ((...)),
 * MULTILINESTRING ((...), (...)), LINESTRING Z (x y z, ...); attribute columns tab-separated (common practice of
 * GIS text exports). Hand-made files.
 */
class WktReaderTest {
    private static final double EXACT = 1e-9;

    static final String WITH_ATTRIBUTES = """
            WKT\tname\tkind
            # fault traces and a heave polygon
            LINESTRING (1000 2000, 1500 2600)\tF1\ttrace

            MULTILINESTRING ((0 0, 10 0), (20 0, 30 5))\tF2\ttrace
            POLYGON ((0 0, 100 0, 100 100, 0 100, 0 0))\tF1\theave
            LINESTRING Z (0 0 1800, 10 10 1850)\tF3\ttrace
            """;

    @TempDir
    Path dir;

    private static List<VectorFeature> read(String text) throws IOException {
        return new WktReader(FileUnits.METRES).read(new StringReader(text), "faults.wkt");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void geometriesAndAttributesAreRead() throws IOException {
        Path file = dir.resolve("faults.wkt");
        Files.writeString(file, WITH_ATTRIBUTES);
        List<VectorFeature> features = new WktReader(FileUnits.METRES).read(file);
        assertEquals(4, features.size());
        assertEquals(Map.of("name", "F1", "kind", "trace"), features.get(0).properties());
        assertEquals(Geometry.TYPENAME_MULTILINESTRING, features.get(1).geometry().getGeometryType());
        assertEquals(10_000, features.get(2).geometry().getArea(), EXACT);
        assertEquals(1850, features.get(3).geometry().getCoordinates()[1].getZ(), EXACT);
    }

    @Test
    void plainGeometryLinesNeedNoHeader() throws IOException {
        List<VectorFeature> features = read("LINESTRING (1 2, 3 4)\nPOLYGON ((0 0, 1 0, 1 1, 0 0))\n");
        assertEquals(2, features.size());
        assertTrue(features.get(0).properties().isEmpty());
    }

    @Test
    void declaredUnitsAreConverted() throws IOException {
        List<VectorFeature> features = new WktReader(new FileUnits(LengthUnit.FOOT, LengthUnit.FOOT))
                .read(new StringReader("LINESTRING Z (1000 0 5000, 0 0 0)\n"), "ft.wkt");
        // 1000 ft = 304.8 m; 5000 ft = 1524 m (1 ft = 0.3048 m exactly; from memory)
        assertEquals(304.8, features.get(0).geometry().getCoordinates()[0].x, EXACT);
        assertEquals(1524, features.get(0).geometry().getCoordinates()[0].getZ(), EXACT);
    }

    @Test
    void badNumberIsReportedWithItsColumn() {
        FormatException e = failure(WITH_ATTRIBUTES.replace("1500 2600", "1500 26O0"));
        // "26O0" starts at column 29
        assertEquals("faults.wkt, line 3, field 1: at column 29, not valid WKT (Invalid number: 26O0)",
                e.getMessage());
    }

    @Test
    void textAfterTheGeometryIsRefused() {
        FormatException e = failure("LINESTRING (0 0, 1 1) , (2 2, 3 3)\n");
        assertEquals("faults.wkt, line 1, field 1: at column 23, text after the end of the geometry: ', (2 2, 3 3)'",
                e.getMessage());
    }

    @Test
    void otherErrorsNameTheLine() {
        FormatException unknown = failure("LINESTRNG (0 0, 1 1)\n");
        assertTrue(unknown.getMessage().contains("at column 1, not valid WKT (Unknown geometry type: LINESTRNG)"),
                unknown.getMessage());
        FormatException point = failure("# one comment\nPOINT (1 2)\n");
        assertEquals(2, point.line());
        assertTrue(point.getMessage().contains("'Point' is not read"), point.getMessage());
        FormatException fields = failure(WITH_ATTRIBUTES.replace("\tF2\ttrace", "\tF2"));
        assertEquals(5, fields.line());
        assertTrue(fields.getMessage().contains("expected 3 tab-separated fields"), fields.getMessage());
        FormatException open = failure("LINESTRING (0 0, 1 1\n");
        assertEquals(1, open.line());
    }

    @Test
    void ringThatDoesNotCloseIsAFormatError() {
        // found by VectorReadersFuzzTest (seed 20261202, input 34): JTS threw IllegalArgumentException
        FormatException e = failure("POLYGON ((0 0, 100 0, 100 100, 0 100, 0 -1))\n");
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("not a valid geometry"), e.getMessage());
    }

    @Test
    void nonFiniteCoordinatesAreRefused() {
        FormatException e = failure("LINESTRING (0 0, 1 1)\nLINESTRING (0 NaN, 1 1)\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("finite"), e.getMessage());
    }

    @Test
    void emptyAttributeNameIsAFormatError() {
        // found by VectorReadersFuzzTest (seed 20261202, input 48): VectorFeature threw IllegalArgumentException
        FormatException e = failure("WKT\t\tkind\nLINESTRING (0 0, 1 1)\tF1\ttrace\n");
        assertEquals(1, e.line());
        assertEquals(2, e.field());
    }
}
