package org.faultbench.core.grid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class GridGeometryTest {
    private final GridGeometry g = new GridGeometry(4, 3, 1000, 2000, 25, 50);

    @Test
    void nodesSitAtOriginPlusMultiplesOfTheSpacing() {
        // node = cell centre convention, hand calculation
        assertEquals(1075, g.x(3), 1e-12);
        assertEquals(2100, g.y(2), 1e-12);
        assertEquals(25 * 50, g.cellArea(), 1e-12);
        assertEquals(12, g.size());
    }

    @Test
    void indexIsRowMajorWithColumnsFastest() {
        assertEquals(2 * 4 + 1, g.index(1, 2));
        assertEquals(1, g.column(9));
        assertEquals(2, g.row(9));
        assertTrue(g.contains(3, 2));
        assertFalse(g.contains(4, 0));
        assertThrows(IndexOutOfBoundsException.class, () -> g.index(4, 0));
    }

    @Test
    void badSpacingOrSizeIsRejectedWithTheFieldNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new GridGeometry(4, 3, 0, 0, 0, 50));
        assertTrue(e.getMessage().contains("dx") && e.getMessage().contains("0.0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new GridGeometry(4, 3, 0, 0, 25, Double.NaN));
        assertTrue(e.getMessage().contains("dy"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new GridGeometry(1, 3, 0, 0, 25, 25));
        assertTrue(e.getMessage().contains("nx = 1"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new GridGeometry(4, 3, Double.NaN, 0, 25, 25));
        assertTrue(e.getMessage().contains("x0"), e.getMessage());
    }

    @Test
    void differentGeometryIsReportedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> g.requireSame(new GridGeometry(4, 3, 1000, 2000, 25, 25), "thickness grid"));
        assertTrue(e.getMessage().startsWith("thickness grid lies on other nodes"), e.getMessage());
    }
}
