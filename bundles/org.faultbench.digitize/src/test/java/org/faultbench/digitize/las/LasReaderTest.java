package org.faultbench.digitize.las;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * LAS 2.0 reading. The files below are invented, laid out like the examples in Appendix 2 of the CWLS LAS 2.0
 * specification (Canadian Well Logging Society 1992): #1 unwrapped with all sections, #2 minimum header, #3 wrapped.
 * Rules checked: sections start with '~', '#' lines are comments, header lines are MNEM.UNIT VALUE : DESCRIPTION
 * with the last colon starting the description (CWLS LAS 2.0 update 2017), ~A comes last, NULL marks missing values,
 * in wrap mode the depth stands alone on its line.
 */
class LasReaderTest {
    private static final double EXACT = 1e-9;

    /** Layout of CWLS example #1: unwrapped, ~V ~W ~C ~P ~O ~A, depths decreasing (negative STEP). */
    static final String UNWRAPPED = """
            ~VERSION INFORMATION
             VERS.                 2.0 :   CWLS LOG ASCII STANDARD -VERSION 2.0
             WRAP.                 NO  :   ONE LINE PER DEPTH STEP
            ~WELL INFORMATION
            #MNEM.UNIT      DATA                  DESCRIPTION
            #----- -----    ----------            -------------------
            STRT    .M      2150.0000             :START DEPTH
            STOP    .M      2149.7500             :STOP DEPTH
            STEP    .M      -0.1250               :STEP
            NULL    .       -999.25               :NULL VALUE
            COMP    .       DEMO OPERATOR         :COMPANY
            WELL    .       DEMO-1                :WELL
            FLD     .       DEMO FIELD            :FIELD
            LOC     .       BLOCK 7 GRID 12       :LOCATION
            SRVC    .       DEMO LOGGING          :SERVICE COMPANY
            DATE    .       2024-05-17 10:30      :LOG DATE
            UWI     .       DEMO0001              :UNIQUE WELL ID
            ~CURVE INFORMATION
            #MNEM.UNIT      API CODES             CURVE DESCRIPTION
             DEPT   .M                            :  1  DEPTH
             GR     .GAPI   45 310 01 00          :  2  GAMMA RAY
             RHOB   .K/M3   45 350 01 00          :  3  BULK DENSITY
             NPHI   .V/V    42 890 00 00          :  4  NEUTRON POROSITY
            ~PARAMETER INFORMATION
             BHT    .DEGC   71.5000               :   BOTTOM HOLE TEMPERATURE
             MATR   .       SAND                  :   NEUTRON MATRIX
            ~OTHER
                 Invented test data; values chosen for hand checks.
            ~A  DEPTH     GR       RHOB      NPHI
            2150.000   45.500  2350.000    0.210
            2149.875   98.250  -999.25     0.330
            2149.750   -999.25 2410.000    0.180
            """;

    /** Layout of CWLS example #2: minimum header, short section names, feet. */
    static final String MINIMUM_FEET = """
            ~V
            VERS.                   2.0   :   CWLS log ASCII Standard -VERSION 2.0
            WRAP.                   NO    :   One line per depth step
            ~W
            STRT.FT                 5000.0  :START DEPTH
            STOP.FT                 5001.0  :STOP DEPTH
            STEP.FT                 0.5     :STEP
            NULL.                   -9999   :NULL VALUE
            WELL.           DEMO-2          :WELL
            ~C
            DEPT.FT                         :   DEPTH
            GR  .GAPI                       :   GAMMA RAY
            ~A
             5000.0   60.0
             5000.5   -9999
             5001.0   90.0
            """;

    /** Layout of CWLS example #3: wrap mode, the depth alone on its line, 9 curves over lines of at most 80 chars. */
    static final String WRAPPED = """
            ~VERSION INFORMATION
             VERS.                 2.0      :   CWLS log ASCII Standard -VERSION 2.0
             WRAP.                 YES      :   Multiple lines per depth step
            ~WELL INFORMATION
            STRT    .M               1830.0000              :START DEPTH
            STOP    .M               1829.7500              :STOP DEPTH
            STEP    .M               -0.2500                :STEP
            NULL    .                -999.25                :NULL VALUE
            WELL    .       DEMO-3                          :WELL
            ~CURVE INFORMATION
             DEPT   .M                              :    Depth
             DT     .US/M                           :  1 Sonic Travel Time
             RHOB   .K/M3                           :  2 Bulk Density
             NPHI   .V/V                            :  3 Neutron Porosity
             RESD   .OHMM                           :  4 Deep Resistivity
             SP     .MV                             :  5 Spontaneous Potential
             GR     .GAPI                           :  6 Gamma Ray
             CALI   .MM                             :  7 Caliper
             PEF    .                               :  8 Photoelectric Factor
            ~A Log data section
            1830.000000
               310.5000  2480.2500     0.2150    12.7500   -45.2500    88.5000
               216.0000     3.1500
            1829.750000
               305.2500  -999.2500     0.2210    11.2500   -44.7500    92.2500
               215.5000     3.0800
            """;

    @TempDir
    Path dir;

    private static LasLog read(String text) throws IOException {
        return new LasReader(FileUnits.METRES).read(new StringReader(text), "demo.las");
    }

    private static FormatException failure(String text) {
        return assertThrows(FormatException.class, () -> read(text));
    }

    @Test
    void unwrappedFileWithAllSectionsIsRead() throws IOException {
        Path file = dir.resolve("demo-1.las");
        Files.writeString(file, UNWRAPPED);
        LasLog log = new LasReader(FileUnits.METRES).read(file);
        assertFalse(log.wrapped());
        assertEquals("DEMO-1", log.wellName());
        assertEquals(LengthUnit.METRE, log.depthUnit());
        assertArrayEquals(new double[] { 2150.0, 2149.875, 2149.75 }, log.depths(), EXACT);
        assertEquals(3, log.curves().size(), "GR, RHOB, NPHI besides the depth index");
        assertArrayEquals(new double[] { 45.5, 98.25, Double.NaN }, log.curve("gr").values(), EXACT);
        assertTrue(Double.isNaN(log.curve("RHOB").values()[1]), "-999.25 is the NULL value");
        assertEquals("K/M3", log.curve("RHOB").unit());
        assertEquals("45 350 01 00", log.curve("RHOB").definition().value(), "API code");
        assertEquals("3  BULK DENSITY", log.curve("RHOB").definition().description());
        assertEquals("71.5000", log.parameters().get(0).value());
        assertEquals("DEGC", log.parameters().get(0).unit());
        assertEquals("Invented test data; values chosen for hand checks.", log.other());
        // last colon starts the description, so a time in the value survives (CWLS LAS 2.0 update 2017)
        assertEquals("2024-05-17 10:30", log.wellItem("DATE").orElseThrow().value());
        assertEquals("-0.1250", log.wellItem("STEP").orElseThrow().value());
    }

    @Test
    void minimumHeaderInFeetIsConvertedToMetres() throws IOException {
        LasLog log = read(MINIMUM_FEET);
        // 5000 ft x 0.3048 m/ft = 1524 m; 5000.5 ft = 1524.1524 m; 5001 ft = 1524.3048 m (1 ft = 0.3048 m exactly,
        // International Yard and Pound Agreement 1959; from memory)
        assertArrayEquals(new double[] { 1524.0, 1524.1524, 1524.3048 }, log.depths(), EXACT);
        assertEquals(LengthUnit.FOOT, log.depthUnit());
        assertArrayEquals(new double[] { 60.0, Double.NaN, 90.0 }, log.curve("GR").values(), EXACT);
        assertTrue(log.parameters().isEmpty());
        assertEquals("", log.other());
    }

    @Test
    void wrappedFileIsRead() throws IOException {
        LasLog log = read(WRAPPED);
        assertTrue(log.wrapped());
        assertArrayEquals(new double[] { 1830.0, 1829.75 }, log.depths(), EXACT);
        assertEquals(8, log.curves().size());
        assertArrayEquals(new double[] { 88.5, 92.25 }, log.curve("GR").values(), EXACT);
        assertArrayEquals(new double[] { 3.15, 3.08 }, log.curve("PEF").values(), EXACT, "value on a wrapped line");
        assertTrue(Double.isNaN(log.curve("RHOB").values()[1]));
    }

    @Test
    void depthUnitMissingOnStrtIsTheDeclaredOne() throws IOException {
        String noUnit = MINIMUM_FEET.replace("STRT.FT", "STRT.").replace("STOP.FT", "STOP.")
                .replace("STEP.FT", "STEP.").replace("DEPT.FT", "DEPT.");
        LasLog log = new LasReader(new FileUnits(LengthUnit.METRE, LengthUnit.FOOT))
                .read(new StringReader(noUnit), "demo.las");
        assertEquals(1524.0, log.depths()[0], EXACT);
        assertEquals(5000.0, read(noUnit).depths()[0], EXACT, "declared metres");
    }

    @Test
    void timeIndexedLogIsRefused() {
        // layout of CWLS example #4 (time-based data): index in seconds
        FormatException e = failure(MINIMUM_FEET.replace("STRT.FT", "STRT.S"));
        assertEquals(5, e.line());
        assertTrue(e.getMessage().contains("not a depth unit"), e.getMessage());
    }

    @Test
    void badNumberIsReportedAtItsLineAndField() {
        FormatException e = failure(UNWRAPPED.replace("2350.000", "23S0.000"));
        assertEquals("demo.las, line 30, field 3: expected a number for curve RHOB, found '23S0.000'",
                e.getMessage());
    }

    @Test
    void wrongValueCountIsReported() {
        FormatException e = failure(UNWRAPPED.replace("0.330", ""));
        assertEquals(31, e.line());
        assertTrue(e.getMessage().contains("expected 4 values (one per curve in ~C), found 3"), e.getMessage());
    }

    @Test
    void wrapModeErrorsAreReported() {
        FormatException notAlone = failure(WRAPPED.replace("1829.750000\n", "1829.750000 305.2500\n"));
        assertEquals(24, notAlone.line());
        assertTrue(notAlone.getMessage().contains("stands alone"), notAlone.getMessage());
        FormatException cut = failure(WRAPPED.substring(0, WRAPPED.lastIndexOf("215.5000")));
        // depth + 6 values on the first wrapped line of the second step
        assertTrue(cut.getMessage().contains("7 of 9 values"), cut.getMessage());
        FormatException tooMany = failure(WRAPPED.replace("3.0800", "3.0800  1.0"));
        assertEquals(26, tooMany.line());
        assertEquals(3, tooMany.field());
    }

    @Test
    void headerErrorsNameTheLine() {
        assertEquals(2, failure(UNWRAPPED.replace("VERS.                 2.0", "VERS.                 1.2")).line());
        assertTrue(failure(UNWRAPPED.replace(" WRAP.", "#WRAP.")).getMessage().contains("no WRAP line"));
        FormatException noNull = failure(UNWRAPPED.replace("NULL    .", "#NULL    ."));
        assertEquals("demo.las, line 4: the ~W section has no NULL line", noNull.getMessage());
        FormatException noColon = failure(UNWRAPPED.replace(":COMPANY", "COMPANY"));
        assertEquals(11, noColon.line());
        FormatException stop = failure(MINIMUM_FEET.replace("STOP.FT", "STOP.M"));
        assertTrue(stop.getMessage().contains("STOP is in 'M'"), stop.getMessage());
        FormatException twice = failure(UNWRAPPED.replace(" NPHI   .V/V", " GR     .V/V"));
        assertEquals("demo.las, line 23: curve GR is defined twice (first on line 21)", twice.getMessage());
    }

    @Test
    void sectionOrderAndPresenceAreChecked() {
        FormatException after = failure(MINIMUM_FEET + "~O\nlate remark\n");
        assertEquals(17, after.line());
        FormatException noCurves = failure(MINIMUM_FEET.replace("~C", "~X"));
        assertTrue(noCurves.getMessage().contains("no ~C"), noCurves.getMessage());
        FormatException leading = failure("junk\n" + MINIMUM_FEET);
        assertEquals(1, leading.line());
        FormatException nullDepth = failure(MINIMUM_FEET.replace(" 5000.5   -9999", " -9999   1.0"));
        assertTrue(nullDepth.getMessage().contains("NULL value"), nullDepth.getMessage());
    }
}
