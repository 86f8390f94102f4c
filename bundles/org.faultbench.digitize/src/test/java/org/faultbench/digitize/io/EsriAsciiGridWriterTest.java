package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EsriAsciiGridWriterTest {
    @TempDir
    Path dir;

    /** A tilted surface with a null node and values that need rounding. */
    private static RegularGrid surface(GridGeometry geometry) {
        double[] values = RegularGrid.sample(geometry, (x, y) -> 1500 + 0.0123456 * x - 0.0456789 * y).values();
        values[geometry.index(2, 1)] = Double.NaN;
        return new RegularGrid(geometry, values);
    }

    private static void assertSameGrid(RegularGrid expected, RegularGrid actual, double valueTolerance) {
        GridGeometry e = expected.geometry();
        GridGeometry a = actual.geometry();
        assertEquals(e.nx(), a.nx());
        assertEquals(e.ny(), a.ny());
        assertEquals(e.x0(), a.x0(), 1e-9);
        assertEquals(e.y0(), a.y0(), 1e-9);
        assertEquals(e.dx(), a.dx(), 1e-9);
        assertEquals(e.dy(), a.dy(), 1e-9);
        for (int k = 0; k < e.size(); k++) {
            if (expected.isNull(k)) {
                assertTrue(actual.isNull(k), "null node " + k + " stays null");
            } else {
                assertEquals(expected.value(k), actual.value(k), valueTolerance, "node " + k);
            }
        }
    }

    @Test
    void writesTheEsriLayoutNorthernRowFirst() throws IOException {
        RegularGrid grid = new RegularGrid(new GridGeometry(3, 2, 1000, 2000, 50, 50),
                new double[] { 2100, 2110.5, Double.NaN, 2200, 2210, 2220.25 });
        StringWriter out = new StringWriter();
        new EsriAsciiGridWriter(FileUnits.METRES, 2).write(grid, out);
        // ESRI help "Esri ASCII raster format": xllcorner = lower-left corner of the lower-left cell =
        // node x0 - cellsize/2 = 975 (hand calculation); row 1 = northern row; NODATA default -9999
        assertEquals("""
                ncols         3
                nrows         2
                xllcorner     975
                yllcorner     1975
                cellsize      50
                NODATA_value  -9999
                2200.00 2210.00 2220.25
                2100.00 2110.50 -9999
                """, out.toString());
    }

    @Test
    void roundTripGivesTheSameGridWithinTheWrittenPrecision() throws IOException {
        RegularGrid grid = surface(new GridGeometry(5, 4, 500012.5, 6000037.5, 25, 25));
        Path file = dir.resolve("surface.asc");
        new EsriAsciiGridWriter(FileUnits.METRES, 3).write(grid, file);
        RegularGrid back = new EsriAsciiGridReader(FileUnits.METRES).read(file);
        // 3 decimals written: values agree to half a unit of the last digit
        assertSameGrid(grid, back, 0.0005);
    }

    @Test
    void roundTripInFeetAndWithRectangularCells() throws IOException {
        RegularGrid grid = surface(new GridGeometry(4, 3, 1000, 2000, 30.48, 15.24));
        FileUnits feet = FileUnits.of(LengthUnit.FOOT);
        StringWriter out = new StringWriter();
        new EsriAsciiGridWriter(feet, 4).write(grid, out);
        // 30.48 m / 0.3048 m/ft = 100 ft, 15.24 m = 50 ft (hand calculation); rectangular cells use dx/dy
        assertTrue(out.toString().contains("\ndx            100\ndy            50\n"), out.toString());
        RegularGrid back = new EsriAsciiGridReader(feet).read(new StringReader(out.toString()), "ft.asc");
        assertSameGrid(grid, back, 0.00005 * 0.3048 + 1e-9);
    }

    @Test
    void valueThatWouldReadBackAsNodataIsRefused() {
        RegularGrid grid = RegularGrid.sample(new GridGeometry(2, 2, 0, 0, 10, 10), (x, y) -> -9999.0001);
        EsriAsciiGridWriter writer = new EsriAsciiGridWriter(FileUnits.METRES, 2);
        Path file = dir.resolve("refused.asc");
        assertThrows(IllegalArgumentException.class, () -> writer.write(grid, file));
        assertTrue(Files.notExists(file), "no half-written file is left");
    }

    @Test
    void badSettingsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new EsriAsciiGridWriter(FileUnits.METRES, -1));
        assertThrows(IllegalArgumentException.class, () -> new EsriAsciiGridWriter(null, 2));
        assertThrows(IllegalArgumentException.class,
                () -> new EsriAsciiGridWriter(FileUnits.METRES, 2, Double.NaN));
    }
}
