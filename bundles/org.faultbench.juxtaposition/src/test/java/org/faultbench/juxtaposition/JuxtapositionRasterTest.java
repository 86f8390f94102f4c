package org.faultbench.juxtaposition;

import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_RESERVOIR;
import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_SEAL;
import static org.faultbench.juxtaposition.JuxtapositionClass.SEAL_SEAL;
import static org.faultbench.juxtaposition.TestFixtures.OVERBURDEN;
import static org.faultbench.juxtaposition.TestFixtures.SAND_A;
import static org.faultbench.juxtaposition.TestFixtures.SAND_B;
import static org.faultbench.juxtaposition.TestFixtures.SHALE;
import static org.faultbench.juxtaposition.TestFixtures.UNDERBURDEN;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;

import org.junit.jupiter.api.Test;

class JuxtapositionRasterTest {

    private static final double EPS = 1e-9;

    private static JuxtapositionRaster constantThrowRaster() {
        // 10 columns x 20 rows of 10 m from 1000 to 1200 m, throw 60 m
        return JuxtapositionRaster.paint(TestFixtures.constantThrow(60), TestFixtures.sameColumnBothWalls(), 1000,
                1200, 10);
    }

    @Test
    void cellsCarryTheUnitsAndClassAtTheirCentres() {
        JuxtapositionRaster raster = constantThrowRaster();
        assertEquals(10, raster.columnCount());
        assertEquals(20, raster.rowCount());
        assertEquals(1085, raster.rowDepth(8), EPS);
        // hand calculation with cut-offs 1000 m (FW) and 1060 m (HW), see the 60 m throw case in HungColumnsTest
        assertCell(raster, 2, SAND_A, OVERBURDEN, RESERVOIR_SEAL);
        assertCell(raster, 5, SHALE, OVERBURDEN, SEAL_SEAL);
        assertCell(raster, 8, SAND_B, SAND_A, RESERVOIR_RESERVOIR);
        assertCell(raster, 13, UNDERBURDEN, SHALE, SEAL_SEAL);
        assertCell(raster, 19, UNDERBURDEN, UNDERBURDEN, SEAL_SEAL);
        assertEquals(60, raster.throwAt(4, 10), EPS);
    }

    private static void assertCell(JuxtapositionRaster raster, int row, int footwall, int hangingWall,
            JuxtapositionClass type) {
        assertEquals(footwall, raster.footwallUnit(3, row), "FW unit at row " + row);
        assertEquals(hangingWall, raster.hangingWallUnit(3, row), "HW unit at row " + row);
        assertSame(type, raster.juxtapositionClass(3, row), "class at row " + row);
    }

    @Test
    void reservoirCellsPerColumnMatchTheThirtyMetreWindow() {
        JuxtapositionRaster raster = constantThrowRaster();
        for (int column = 0; column < raster.columnCount(); column++) {
            int reservoirCells = 0;
            for (int row = 0; row < raster.rowCount(); row++) {
                if (raster.juxtapositionClass(column, row) == RESERVOIR_RESERVOIR) {
                    reservoirCells++;
                }
            }
            // 30 m window / 10 m rows (common-practice window formula)
            assertEquals(3, reservoirCells, "column " + column);
        }
    }

    @Test
    void columnsWithoutDataAreMarked() {
        JuxtapositionRaster raster = JuxtapositionRaster.paint(TestFixtures.columns(1000, 60, Double.NaN),
                TestFixtures.sameColumnBothWalls(), 1000, 1100, 25);
        assertEquals(4, raster.rowCount());
        assertTrue(raster.hasData(0, 0));
        assertFalse(raster.hasData(1, 0));
        assertEquals(JuxtapositionRaster.NO_UNIT, raster.footwallUnit(1, 2));
        assertTrue(Double.isNaN(raster.throwAt(1, 2)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> raster.juxtapositionClass(1, 2));
        assertTrue(e.getMessage().contains("has no data"), e.getMessage());
        assertThrows(IndexOutOfBoundsException.class, () -> raster.cellIndex(2, 0));
    }

    @Test
    void attributeSlotsArePaintedInPlace() {
        JuxtapositionRaster raster = constantThrowRaster();
        double[] sgr = raster.addAttribute("SGR");
        assertEquals(200, sgr.length);
        assertTrue(Double.isNaN(sgr[0]), "slots start empty");
        sgr[raster.cellIndex(3, 8)] = 0.42;
        assertEquals(0.42, raster.attribute("SGR")[raster.cellIndex(3, 8)], EPS);
        assertEquals(Set.of("SGR"), raster.attributeNames());
        IllegalArgumentException duplicate = assertThrows(IllegalArgumentException.class,
                () -> raster.addAttribute("SGR"));
        assertEquals("raster attribute 'SGR' already exists", duplicate.getMessage());
        IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                () -> raster.attribute("leak probability"));
        assertEquals("raster has no attribute 'leak probability'; it has [SGR]", missing.getMessage());
    }

    @Test
    void badDepthRangeOrRowHeightIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> JuxtapositionRaster.paint(TestFixtures.constantThrow(60),
                TestFixtures.sameColumnBothWalls(), 1200, 1000, 10));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> JuxtapositionRaster.paint(TestFixtures.constantThrow(60), TestFixtures.sameColumnBothWalls(),
                        1000, 1200, 0));
        assertEquals("raster row height dz must be a finite number > 0, was 0.0", e.getMessage());
    }
}
