package org.faultbench.digitize.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.units.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Well-tops CSV (common practice; no formal standard): header row naming Well, Surface/Horizon, X, Y,
 * TVDSS/Z/Depth and optionally MD, in any order; quoting per RFC 4180 (Shafranovich 2005).
 */
class WellTopsCsvReaderTest {
    private static final double EXACT = 1e-9;

    // columns in a different order and letter case than usual, aliases Horizon and Depth, an extra column
    static final String SAMPLE = """
            well,HORIZON,md,y,x,Depth,Interpreter
            "Well A, deviated",Top Sand,2510.5,6000100,500200,2450.25,"checked ""ok""\"

            W-2,Top Sand,,6001000,501000,2475.0,
            """;

    @TempDir
    Path dir;

    private static List<WellTop> read(String text) throws IOException {
        return new WellTopsCsvReader(FileUnits.METRES, DepthSign.POSITIVE_DOWN).read(new StringReader(text),
                "tops.csv");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void topsAreReadByColumnName() throws IOException {
        Path file = dir.resolve("tops.csv");
        Files.writeString(file, SAMPLE);
        List<WellTop> tops = new WellTopsCsvReader(FileUnits.METRES, DepthSign.POSITIVE_DOWN).read(file);
        assertEquals(2, tops.size());
        // RFC 4180 rule 6: a quoted field may hold a comma
        assertEquals(new WellTop("Well A, deviated", "Top Sand", 500200, 6000100, 2450.25, 2510.5), tops.get(0));
        WellTop second = tops.get(1);
        assertEquals("W-2", second.well());
        assertEquals(2475.0, second.tvdss(), EXACT);
        assertTrue(Double.isNaN(second.md()), "empty MD field gives NaN");
    }

    @Test
    void missingMdColumnGivesNaN() throws IOException {
        List<WellTop> tops = read("Well,Surface,X,Y,TVDSS\nW-1,Base Sand,1,2,3000\n");
        assertTrue(Double.isNaN(tops.get(0).md()));
        assertEquals("Base Sand", tops.get(0).surface());
    }

    @Test
    void negativeDownElevationsAreFlippedButMdIsNot() throws IOException {
        String text = "Well,Surface,X,Y,Z,MD\nW-1,Top Sand,1,2,-2450.25,2510.5\n";
        WellTop top = new WellTopsCsvReader(FileUnits.METRES, DepthSign.NEGATIVE_DOWN)
                .read(new StringReader(text), "tops.csv").get(0);
        // elevation -2450.25 m = 2450.25 m below datum (TVDSS positive down, common practice)
        assertEquals(2450.25, top.tvdss(), EXACT);
        assertEquals(2510.5, top.md(), EXACT);
    }

    @Test
    void feetAreConvertedToMetres() throws IOException {
        String text = "Well,Surface,X,Y,TVDSS,MD\nW-1,Top Sand,1000,2000,1000,1100\n";
        WellTop top = new WellTopsCsvReader(new FileUnits(LengthUnit.METRE, LengthUnit.FOOT), DepthSign.POSITIVE_DOWN)
                .read(new StringReader(text), "tops.csv").get(0);
        // 1 ft = 0.3048 m exactly (International Yard and Pound Agreement 1959; from memory):
        // 1000 ft = 304.8 m, 1100 ft = 335.28 m (hand calculation); x, y declared in metres stay
        assertEquals(304.8, top.tvdss(), EXACT);
        assertEquals(335.28, top.md(), EXACT);
        assertEquals(1000, top.x(), EXACT);
    }

    @Test
    void missingRequiredColumnIsNamed() {
        FormatException e = failure("Well,Surface,X,Y,MD\nW-1,Top,1,2,3\n");
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("TVDSS, Z or Depth"), e.getMessage());
        FormatException noWell = failure("Surface,X,Y,TVDSS\nTop,1,2,3\n");
        assertTrue(noWell.getMessage().contains("no well name column") && noWell.getMessage().contains("Well"),
                noWell.getMessage());
    }

    @Test
    void twoColumnsForTheSameThingAreRefused() {
        FormatException e = failure("Well,Surface,Horizon,X,Y,TVDSS\n");
        assertEquals(1, e.line());
        assertEquals(3, e.field());
    }

    @Test
    void rowWithTheWrongFieldCountIsReported() {
        FormatException e = failure(SAMPLE.replace("W-2,Top Sand,,", "W-2,Top Sand,"));
        assertEquals(4, e.line());
        assertTrue(e.getMessage().contains("expected 7 fields") && e.getMessage().contains("found 6"),
                e.getMessage());
    }

    @Test
    void badNumberNamesItsColumn() {
        FormatException bad = failure(SAMPLE.replace("2475.0", "deep"));
        assertEquals("tops.csv, line 4, field 6: expected a number for Depth, found 'deep'", bad.getMessage());
    }

    @Test
    void emptyWellNameAndEmptyFileAreRefused() {
        FormatException noName = failure(SAMPLE.replace("W-2,", ","));
        assertEquals(4, noName.line());
        assertEquals(1, noName.field());
        FormatException empty = failure("\n\n");
        assertEquals(0, empty.line());
    }
}
