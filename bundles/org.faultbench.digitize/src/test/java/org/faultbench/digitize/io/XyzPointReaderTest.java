package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * XYZ layout (common practice; no formal standard): x y z [attributes], blank- or comma-separated, '#' comments,
 * optional header line, null z markers such as -999.25 or 1e30.
 */
class XyzPointReaderTest {
    private static final double EXACT = 1e-9;

    static final String SAMPLE = """
            # top sand depth points, metres
            X Y Z
            1000.0 2000.0 1500.5
            1010.0\t2000.0 -999.25

            1020.0   2010.0   1520.0  A12 good
            1030,2020,1E30
            1040, 2030, 1540.0, picked
            """;

    @TempDir
    Path dir;

    private static XyzPoints read(String text) throws IOException {
        return new XyzPointReader(FileUnits.METRES).read(new StringReader(text), "points.xyz");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void pointsAreReadAndNullRowsSkippedAndCounted() throws IOException {
        Path file = dir.resolve("points.xyz");
        Files.writeString(file, SAMPLE);
        XyzPoints read = new XyzPointReader(FileUnits.METRES).read(file);
        assertEquals(List.of(new XyzPoint(1000, 2000, 1500.5), new XyzPoint(1020, 2010, 1520),
                new XyzPoint(1040, 2030, 1540)), read.points());
        // -999.25 and 1E30 are null markers by default (common practice)
        assertEquals(2, read.nullRows());
    }

    @Test
    void nullMarkersCanBeChosen() throws IOException {
        XyzPoints read = new XyzPointReader(FileUnits.METRES, Set.of(-99999.0)).read(new StringReader(SAMPLE), "p");
        assertEquals(5, read.points().size());
        assertEquals(-999.25, read.points().get(1).z(), EXACT);
        assertEquals(0, read.nullRows());
    }

    @Test
    void mapAndDepthUnitsAreConvertedSeparately() throws IOException {
        XyzPoints read = new XyzPointReader(new FileUnits(LengthUnit.METRE, LengthUnit.FOOT))
                .read(new StringReader("1000 2000 1500\n"), "ft.xyz");
        XyzPoint p = read.points().get(0);
        assertEquals(1000, p.x(), EXACT);
        assertEquals(2000, p.y(), EXACT);
        // 1500 ft x 0.3048 m/ft = 457.2 m (1 ft = 0.3048 m exactly, International Yard and Pound Agreement 1959;
        // from memory)
        assertEquals(457.2, p.z(), EXACT);
    }

    @Test
    void fileWithoutHeaderOrPointsIsFine() throws IOException {
        assertEquals(1, read("1 2 3\n").points().size());
        XyzPoints none = read("# nothing here\n\n");
        assertTrue(none.points().isEmpty());
        assertEquals(0, none.nullRows());
    }

    @Test
    void badNumberIsReportedAtItsLineAndField() {
        FormatException e = failure(SAMPLE.replace("1020.0   2010.0", "1020.0   20l0.0"));
        assertEquals("points.xyz, line 6, field 2: expected a number for y, found '20l0.0'", e.getMessage());
    }

    @Test
    void rowWithTooFewFieldsIsRefused() {
        FormatException e = failure(SAMPLE.replace("1000.0 2000.0 1500.5", "1000.0 2000.0"));
        assertEquals(3, e.line());
        assertEquals(0, e.field());
        assertTrue(e.getMessage().contains("at least 3 fields"), e.getMessage());
    }

    @Test
    void emptyCommaFieldIsReported() {
        FormatException e = failure(SAMPLE.replace("1030,2020,1E30", "1030,,1E30"));
        assertEquals(7, e.line());
        assertEquals(2, e.field());
        assertTrue(e.getMessage().contains("empty field"), e.getMessage());
    }

    @Test
    void textRowAfterTheFirstIsAnError() {
        FormatException e = failure(SAMPLE + "X Y Z\n");
        assertEquals(9, e.line());
        assertEquals(1, e.field());
    }

    @Test
    void firstRowMixingTextAndNumbersIsNotAHeader() {
        FormatException e = failure("X 2000 Z\n1 2 3\n");
        assertEquals(1, e.line());
        assertEquals(1, e.field());
    }
}
