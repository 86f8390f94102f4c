package org.faultbench.digitize.io;

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
 * Layout checked against the ESRI help page "Esri ASCII raster format" (ArcGIS 10.x help): keyword header ncols,
 * nrows, xllcorner|xllcenter, yllcorner|yllcenter, cellsize, optional NODATA_value defaulting to -9999; row 1 of the
 * data is the top (northern) row; xllcorner is the lower-left corner of the lower-left cell, xllcenter its centre;
 * line breaks inside the data are not required.
 */
class EsriAsciiGridReaderTest {
    private static final double EXACT = 1e-9;

    // 4 columns x 3 rows of 50 m cells, lower-left corner at (1000, 2000); first data row = northern row
    static final String SAMPLE = """
            ncols         4
            nrows         3
            xllcorner     1000
            yllcorner     2000
            cellsize      50
            NODATA_value  -9999
            2300.5 2310 2320 2330
            2200 -9999 2220 2230
            2100 2110 2120 2130.25
            """;

    @TempDir
    Path dir;

    private static RegularGrid read(String text) throws IOException {
        return new EsriAsciiGridReader(FileUnits.METRES).read(new StringReader(text), "sample.asc");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void nodesSitAtCellCentresAndTheFirstDataRowIsNorth() throws IOException {
        Path file = dir.resolve("sample.asc");
        Files.writeString(file, SAMPLE);
        RegularGrid grid = new EsriAsciiGridReader(FileUnits.METRES).read(file);
        // ESRI help: xllcorner is the lower-left corner of the lower-left cell, so its centre is
        // xllcorner + cellsize/2 = 1000 + 25 (hand calculation)
        assertEquals(new GridGeometry(4, 3, 1025, 2025, 50, 50), grid.geometry());
        // ESRI help: row 1 of the data is the top of the raster -> grid row j = nrows - 1
        assertEquals(2300.5, grid.value(0, 2), EXACT, "north-west cell");
        assertEquals(2330, grid.value(3, 2), EXACT, "north-east cell");
        assertEquals(2100, grid.value(0, 0), EXACT, "south-west cell");
        assertEquals(2130.25, grid.value(3, 0), EXACT, "south-east cell");
        // ESRI help: cells equal to NODATA_value have no data
        assertTrue(Double.isNaN(grid.value(1, 1)), "NODATA cell becomes a null node");
    }

    @Test
    void cellCentreOriginIsTakenAsTheFirstNode() throws IOException {
        String text = SAMPLE.replace("xllcorner     1000", "XLLCENTER 1025").replace("yllcorner     2000",
                "YLLCENTER 2025");
        // ESRI help: xllcenter/yllcenter give the centre of the lower-left cell; keys in upper case as in the help
        assertEquals(new GridGeometry(4, 3, 1025, 2025, 50, 50), read(text).geometry());
    }

    @Test
    void missingNodataValueDefaultsToMinus9999() throws IOException {
        RegularGrid grid = read(SAMPLE.replace("NODATA_value  -9999\n", ""));
        // ESRI help: NODATA_VALUE is optional, default -9999
        assertTrue(Double.isNaN(grid.value(1, 1)));
    }

    @Test
    void lineBreaksInsideTheDataCarryNoMeaning() throws IOException {
        String oneLine = SAMPLE.substring(0, SAMPLE.indexOf("2300.5"))
                + "2300.5 2310 2320 2330 2200 -9999 2220 2230\n2100 2110\n2120 2130.25\n";
        // ESRI help: no carriage returns are necessary at the end of each row; ncols decides where a row ends
        assertEquals(read(SAMPLE).geometry(), read(oneLine).geometry());
        RegularGrid grid = read(oneLine);
        assertEquals(2230, grid.value(3, 1), EXACT);
        assertEquals(2110, grid.value(1, 0), EXACT);
    }

    @Test
    void rectangularCellsFromDxAndDy() throws IOException {
        String text = SAMPLE.replace("cellsize      50", "dx 50\ndy 25");
        // dx/dy header keys: GDAL AAIGrid driver extension for non-square cells (from memory)
        assertEquals(new GridGeometry(4, 3, 1025, 2012.5, 50, 25), read(text).geometry());
    }

    @Test
    void feetAreConvertedToMetres() throws IOException {
        String text = SAMPLE.replace("cellsize      50", "cellsize      100");
        RegularGrid grid = new EsriAsciiGridReader(FileUnits.of(LengthUnit.FOOT))
                .read(new StringReader(text), "ft.asc");
        // 1 ft = 0.3048 m exactly (International Yard and Pound Agreement 1959; NIST SP 811, 2008, App. B; from
        // memory): node x0 = (1000 + 100/2) ft = 1050 ft = 320.04 m, y0 = 2050 ft = 624.84 m, dx = 30.48 m,
        // 2100 ft = 640.08 m (hand calculation)
        assertEquals(320.04, grid.x(0), EXACT);
        assertEquals(624.84, grid.y(0), EXACT);
        assertEquals(30.48, grid.geometry().dx(), EXACT);
        assertEquals(640.08, grid.value(0, 0), EXACT);
    }

    @Test
    void mapAndDepthUnitsCanDiffer() throws IOException {
        RegularGrid grid = new EsriAsciiGridReader(new FileUnits(LengthUnit.METRE, LengthUnit.FOOT))
                .read(new StringReader(SAMPLE), "mixed.asc");
        assertEquals(1025, grid.x(0), EXACT, "x stays in metres");
        // 2100 ft x 0.3048 m/ft = 640.08 m (hand calculation)
        assertEquals(640.08, grid.value(0, 0), EXACT, "depth converted from feet");
    }

    @Test
    void badNumberIsReportedAtItsLineAndField() {
        FormatException e = failure(SAMPLE.replace("2200 -9999 2220", "2200 -9999 abc"));
        assertEquals("sample.asc, line 8, field 3: expected a number for the grid value, found 'abc'",
                e.getMessage());
    }

    @Test
    void headerWithoutNcolsIsReportedWhereTheDataStarts() {
        FormatException e = failure(SAMPLE.replace("ncols         4\n", ""));
        assertEquals(6, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("without 'ncols'"), e.getMessage());
    }

    @Test
    void truncatedDataIsReportedWithTheCountFound() {
        FormatException e = failure(SAMPLE.replace(" 2130.25", ""));
        assertEquals(9, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("ends after 11 values") && e.getMessage().contains("= 12"),
                e.getMessage());
    }

    @Test
    void extraValueIsReportedAtItsPosition() {
        FormatException e = failure(SAMPLE.replace("2120 2130.25", "2120 2130.25 2140"));
        assertEquals(9, e.line());
        assertEquals(5, e.field());
    }

    @Test
    void inconsistentHeadersAreRefusedAtTheOffendingLine() {
        FormatException mixed = failure(SAMPLE.replace("yllcorner     2000", "yllcenter 2025"));
        assertEquals(4, mixed.line(), mixed.getMessage());
        FormatException twice = failure(SAMPLE.replace("cellsize      50", "cellsize 50\nCELLSIZE 50"));
        assertEquals(6, twice.line(), twice.getMessage());
        FormatException unknown = failure(SAMPLE.replace("cellsize      50", "cellsise 50"));
        assertEquals(5, unknown.line());
        assertEquals(1, unknown.field());
        FormatException zeroCell = failure(SAMPLE.replace("cellsize      50", "cellsize 0"));
        assertEquals(5, zeroCell.line());
        assertEquals(2, zeroCell.field());
        FormatException oneColumn = failure(SAMPLE.replace("ncols         4", "ncols 1"));
        assertEquals(1, oneColumn.line());
        assertEquals(2, oneColumn.field());
        FormatException notWhole = failure(SAMPLE.replace("nrows         3", "nrows 3.5"));
        assertEquals(2, notWhole.line());
        assertTrue(notWhole.getMessage().contains("whole number"), notWhole.getMessage());
    }

    @Test
    void emptyFileIsReportedForTheWholeFile() {
        FormatException e = failure("");
        assertEquals(0, e.line());
        assertTrue(e.getMessage().startsWith("sample.asc: "), e.getMessage());
    }

    @Test
    void declaredSizeBeyondTheFileIsRefusedBeforeAllocating() {
        // the ZMAP+ reader ran out of memory on such a header (fuzz test); the ESRI header is guarded the same way
        FormatException e = failure(SAMPLE.replace("nrows         3", "nrows         400000000"));
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("can hold at most"), e.getMessage());
    }
}
