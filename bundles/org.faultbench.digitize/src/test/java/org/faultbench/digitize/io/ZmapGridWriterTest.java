package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Layout: informal ZMAP+ description behind GDAL's driver page "ZMap -- ZMap Plus Grid" (from memory). */
class ZmapGridWriterTest {
    @TempDir
    Path dir;

    private static RegularGrid surface(GridGeometry geometry) {
        double[] values = RegularGrid.sample(geometry, (x, y) -> 2000 + 0.0123456 * x - 0.0456789 * y).values();
        values[geometry.index(1, 2)] = Double.NaN;
        return new RegularGrid(geometry, values);
    }

    private static String write(RegularGrid grid, FileUnits units, ZmapNodeConvention convention, int decimals)
            throws IOException {
        StringWriter out = new StringWriter();
        new ZmapGridWriter(units, convention, decimals).write(grid, "TOP SAND", out);
        return out.toString();
    }

    private static void assertSameGrid(RegularGrid expected, RegularGrid actual, double valueTolerance) {
        GridGeometry e = expected.geometry();
        GridGeometry a = actual.geometry();
        assertEquals(e.nx(), a.nx());
        assertEquals(e.ny(), a.ny());
        assertEquals(e.x0(), a.x0(), 1e-6);
        assertEquals(e.y0(), a.y0(), 1e-6);
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
    void columnsStartOnNewLinesAndWrapAtFiveValues() throws IOException {
        RegularGrid grid = surface(new GridGeometry(3, 7, 1000, 2000, 100, 50));
        List<String> lines = write(grid, FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_POINT, 2).lines().toList();
        int closing = lines.indexOf("@");
        assertEquals("@TOP SAND, GRID, 5", lines.get(1));
        // pixel is point: bounds are the outer nodes, xmax = 1000 + 2 x 100, ymax = 2000 + 6 x 50 (hand calculation)
        assertTrue(lines.get(3).endsWith("1000, 1200, 2000, 2300"), lines.get(3));
        assertTrue(lines.get(3).replace(" ", "").startsWith("7,3,"), "nrows before ncols: " + lines.get(3));
        List<String> data = lines.subList(closing + 1, lines.size());
        // 7 values per column at 5 per line = 2 lines per column, each column on a new line: 3 x 2 lines
        assertEquals(6, data.size());
        assertEquals(5, data.get(0).trim().split("\\s+").length);
        assertEquals(2, data.get(1).trim().split("\\s+").length);
        // first value is the node at (xmin, ymax): 2000 + 0.0123456 x 1000 - 0.0456789 x 2300 = 1907.28413
        assertEquals("1907.28", data.get(0).trim().split("\\s+")[0]);
        int width = Integer.parseInt(lines.get(2).split(",")[0].trim());
        assertTrue(data.stream().allMatch(line -> line.length() % width == 0), "fixed field width " + width);
    }

    @Test
    void roundTripGivesTheSameGridWithinTheWrittenPrecision() throws IOException {
        RegularGrid grid = surface(new GridGeometry(6, 7, 500012.5, 6000037.5, 25, 25));
        Path file = dir.resolve("top.zmap");
        new ZmapGridWriter(FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_POINT, 3).write(grid, "TOP SAND", file);
        RegularGrid back = new ZmapGridReader(FileUnits.METRES).read(file);
        // 3 decimals written: values agree to half a unit of the last digit
        assertSameGrid(grid, back, 0.0005);
    }

    @Test
    void roundTripWithPixelIsAreaAndFeet() throws IOException {
        RegularGrid grid = surface(new GridGeometry(4, 6, 1000, 2000, 30.48, 60.96));
        FileUnits feet = new FileUnits(LengthUnit.FOOT, LengthUnit.FOOT);
        String text = write(grid, feet, ZmapNodeConvention.PIXEL_IS_AREA, 4);
        // pixel is area: xmin = first node - dx/2 = 1000 m / 0.3048 - 50 ft (hand calculation)
        String xmin = text.lines().toList().get(3).split(",")[2].trim();
        assertEquals(1000 / 0.3048 - 50, Double.parseDouble(xmin), 1e-9);
        RegularGrid back = new ZmapGridReader(feet, ZmapNodeConvention.PIXEL_IS_AREA)
                .read(new StringReader(text), "ft.zmap");
        assertSameGrid(grid, back, 0.00005 * 0.3048 + 1e-9);
    }

    @Test
    void readingWithTheOtherConventionShiftsTheGrid() throws IOException {
        RegularGrid grid = surface(new GridGeometry(4, 3, 1000, 2000, 100, 100));
        String text = write(grid, FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_POINT, 2);
        RegularGrid misread = new ZmapGridReader(FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_AREA)
                .read(new StringReader(text), "top.zmap");
        // bounds 1000..1300 taken as cell edges: dx = 300 / 4 = 75 instead of 100 (hand calculation)
        assertEquals(75, misread.geometry().dx(), 1e-9);
    }

    @Test
    void badNamesAndSettingsAreRefused() {
        RegularGrid grid = surface(new GridGeometry(2, 3, 0, 0, 10, 10));
        ZmapGridWriter writer = new ZmapGridWriter(FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_POINT, 2);
        assertThrows(IllegalArgumentException.class, () -> writer.write(grid, "TOP, SAND", new StringWriter()));
        assertThrows(IllegalArgumentException.class, () -> writer.write(grid, " ", new StringWriter()));
        assertThrows(IllegalArgumentException.class,
                () -> new ZmapGridWriter(FileUnits.METRES, ZmapNodeConvention.PIXEL_IS_POINT, 0));
        assertThrows(IllegalArgumentException.class, () -> new ZmapGridWriter(FileUnits.METRES, null, 2));
    }
}
