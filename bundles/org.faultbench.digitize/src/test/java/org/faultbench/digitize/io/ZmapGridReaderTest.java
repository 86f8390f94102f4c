package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Layout from the informal ZMAP+ description behind GDAL's driver page "ZMap -- ZMap Plus Grid" (from memory):
 * '!' comments; header between '@' lines: name, GRID, nodes_per_line / field_width, null_value, null_text,
 * decimal_places, start_column / nrows, ncols, xmin, xmax, ymin, ymax / 0.0, 0.0, 0.0; data column-major from
 * (xmin, ymax) down each column, columns left to right, wrapped at nodes_per_line, each column on a new line.
 */
class ZmapGridReaderTest {
    private static final double EXACT = 1e-9;

    // Hand-made: 3 rows x 4 columns, 2 values per line, so every column takes two lines (2 + 1).
    // Same map as EsriAsciiGridReaderTest.SAMPLE: column 1 from north to south is 2300.5, 2200, 2100.
    static final String SAMPLE = """
            ! hand-made test grid, depths in metres
            ! second comment line
            @TOP SAND, GRID, 2
                 12,  1.0E+30,      ,  2,  1
                  3,        4, 1000.0, 1300.0, 2000.0, 2200.0
            0.0, 0.0, 0.0
            @
                2300.50     2200.00
                2100.00
                2310.00     1.0E+30
                2110.00
                2320.00     2220.00
                2120.00
                2330.00     2230.00
                2130.25
            """;

    @TempDir
    Path dir;

    private static RegularGrid read(String text) throws IOException {
        return new ZmapGridReader(FileUnits.METRES).read(new StringReader(text), "top.zmap");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void handMadeGridIsReadColumnByColumnFromTheNorth() throws IOException {
        Path file = dir.resolve("top.zmap");
        Files.writeString(file, SAMPLE);
        RegularGrid grid = new ZmapGridReader(FileUnits.METRES).read(file);
        // default: xmin..xmax are outer node positions, dx = (1300 - 1000) / (4 - 1) = 100 (hand calculation)
        assertEquals(new GridGeometry(4, 3, 1000, 2000, 100, 100), grid.geometry());
        // GDAL ZMap description: the first value is the node at (xmin, ymax); each column runs down (decreasing y)
        assertEquals(2300.5, grid.value(0, 2), EXACT, "(xmin, ymax)");
        assertEquals(2100, grid.value(0, 0), EXACT, "(xmin, ymin)");
        assertEquals(2330, grid.value(3, 2), EXACT, "(xmax, ymax)");
        assertEquals(2130.25, grid.value(3, 0), EXACT, "(xmax, ymin)");
        assertEquals(2220, grid.value(2, 1), EXACT);
        // null_value 1.0E+30 marks a null node
        assertTrue(Double.isNaN(grid.value(1, 1)));
    }

    @Test
    void sameMapInEsriLayoutGivesTheSameNodes() throws IOException {
        String esri = EsriAsciiGridReaderTest.SAMPLE.replace("xllcorner     1000", "xllcenter 1000")
                .replace("yllcorner     2000", "yllcenter 2000").replace("cellsize      50", "cellsize 100");
        RegularGrid fromEsri = new EsriAsciiGridReader(FileUnits.METRES).read(new StringReader(esri), "same.asc");
        RegularGrid fromZmap = read(SAMPLE);
        // ESRI stores rows from the north, ZMAP+ columns from the north: both must land on the same nodes
        assertEquals(fromEsri.geometry(), fromZmap.geometry());
        assertArrayEquals(fromEsri.values(), fromZmap.values(), EXACT);
    }

    @Test
    void pixelIsAreaTakesTheBoundsAsCellEdges() throws IOException {
        RegularGrid grid = new ZmapGridReader(FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_AREA)
                .read(new StringReader(SAMPLE), "top.zmap");
        // GDAL ZMap driver page: PIXEL_IS_AREA by default there; dx = 300 / 4 = 75, first node at
        // 1000 + 37.5; dy = 200 / 3, first node at 2000 + 100/3 (hand calculation)
        GridGeometry g = grid.geometry();
        assertEquals(75, g.dx(), EXACT);
        assertEquals(1037.5, g.x0(), EXACT);
        assertEquals(200.0 / 3, g.dy(), EXACT);
        assertEquals(2000 + 100.0 / 3, g.y0(), EXACT);
        assertEquals(2300.5, grid.value(0, 2), EXACT);
    }

    @Test
    void firstHeaderLineMayFollowALoneAt() throws IOException {
        String text = SAMPLE.replace("@TOP SAND, GRID, 2", "@\nTOP SAND, GRID, 2");
        assertArrayEquals(read(SAMPLE).values(), read(text).values(), EXACT);
    }

    @Test
    void nullTextIsUsedWhenNullValueIsBlank() throws IOException {
        String text = SAMPLE.replace("12,  1.0E+30,      ,", "12,         , -99999.0,")
                .replace("1.0E+30\n", "-99999.00\n");
        assertTrue(Double.isNaN(read(text).value(1, 1)));
    }

    @Test
    void feetAreConvertedToMetres() throws IOException {
        RegularGrid grid = new ZmapGridReader(FileUnits.of(LengthUnit.FOOT)).read(new StringReader(SAMPLE), "ft.zmap");
        // 1 ft = 0.3048 m exactly (International Yard and Pound Agreement 1959; from memory):
        // xmin 1000 ft = 304.8 m, dx 100 ft = 30.48 m, 2100 ft = 640.08 m (hand calculation)
        assertEquals(304.8, grid.x(0), EXACT);
        assertEquals(30.48, grid.geometry().dx(), EXACT);
        assertEquals(640.08, grid.value(0, 0), EXACT);
    }

    @Test
    void truncatedDataIsReportedAtTheEndWithTheIncompleteColumn() {
        FormatException e = failure(SAMPLE.replace("    2130.25\n", ""));
        assertEquals(14, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("ends after 11 of") && e.getMessage().contains("column 4"),
                e.getMessage());
    }

    @Test
    void badNumberIsReportedAtItsLineAndField() {
        FormatException e = failure(SAMPLE.replace("2320.00     2220.00", "2320.00     22x0.00"));
        assertEquals("top.zmap, line 12, field 2: expected a number for the grid value, found '22x0.00'",
                e.getMessage());
    }

    @Test
    void lineWithMoreValuesThanTheHeaderAllowsIsRefused() {
        FormatException e = failure(SAMPLE.replace("2100.00\n", "2100.00 2310.00 1.0E+30\n")
                .replace("    2310.00     1.0E+30\n", ""));
        assertEquals(9, e.line());
        assertEquals(3, e.field());
    }

    @Test
    void moreValuesThanTheGridHoldsAreRefused() {
        FormatException e = failure(SAMPLE + "    2140.00\n");
        assertEquals(16, e.line());
        assertEquals(1, e.field());
    }

    @Test
    void headerProblemsPointAtTheirLineAndField() {
        FormatException notGrid = failure(SAMPLE.replace("TOP SAND, GRID, 2", "TOP SAND, POINT, 2"));
        assertEquals(3, notGrid.line());
        assertEquals(2, notGrid.field());
        FormatException oneRow = failure(SAMPLE.replace("      3,        4,", "      1,        4,"));
        assertEquals(5, oneRow.line());
        assertEquals(1, oneRow.field());
        FormatException reversed = failure(SAMPLE.replace("1000.0, 1300.0", "1300.0, 1000.0"));
        assertEquals(5, reversed.line());
        assertEquals(4, reversed.field());
        FormatException shortLine = failure(SAMPLE.replace("  2,  1\n", "  2\n"));
        assertEquals(4, shortLine.line());
        FormatException unclosed = failure(SAMPLE.replace("0.0, 0.0, 0.0\n@\n", "0.0, 0.0, 0.0\n"));
        assertEquals(7, unclosed.line());
        assertTrue(unclosed.getMessage().contains("'@'"), unclosed.getMessage());
        FormatException noNull = failure(SAMPLE.replace("1.0E+30,      ,", "       ,      ,"));
        assertEquals(4, noNull.line());
        assertEquals(2, noNull.field());
    }

    @Test
    void textBeforeTheHeaderIsRefused() {
        FormatException e = failure("grid exported today\n" + SAMPLE);
        assertEquals(1, e.line());
    }

    @Test
    void declaredSizeBeyondTheFileIsRefusedBeforeAllocating() {
        // found by TextReadersFuzzTest (seed 20261202, input 8025): ncols 429496729 ran out of memory
        FormatException e = failure(SAMPLE.replace("      3,        4,", "      3,  429496729,"));
        assertEquals(5, e.line());
        assertTrue(e.getMessage().contains("can hold at most"), e.getMessage());
    }
}
