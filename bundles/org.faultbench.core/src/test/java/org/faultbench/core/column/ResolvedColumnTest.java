package org.faultbench.core.column;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.LithologyClass;
import org.junit.jupiter.api.Test;

class ResolvedColumnTest {
    // Sand A 0-50 m, shale 50-80 m, sand B 80-130 m: the three-unit column used for the SGR and juxtaposition
    // check values (hand calculation, common practice).
    private final ResolvedColumn column = new ResolvedColumn(List.of(
            new UnitSlice("Sand A", LithologyClass.RESERVOIR, true, 50, 0.1),
            new UnitSlice("Shale", LithologyClass.SEAL, false, 30, 0.9),
            new UnitSlice("Sand B", LithologyClass.RESERVOIR, true, 50, 0.1)));

    @Test
    void topsAndBasesAccumulateThicknesses() {
        assertEquals(0, column.top(0));
        assertEquals(50, column.base(0));
        assertEquals(80, column.top(2));
        assertEquals(130, column.thickness());
    }

    @Test
    void unitAtUsesHalfOpenIntervals() {
        assertEquals(-1, column.unitAt(-0.1), "above the column is overburden");
        assertEquals(0, column.unitAt(0));
        assertEquals(1, column.unitAt(50), "a boundary belongs to the unit below it");
        assertEquals(2, column.unitAt(129.9));
        assertEquals(3, column.unitAt(130), "below the column is underburden");
    }

    @Test
    void badUnitsAreRejectedWithTheirNameAndField() {
        IllegalArgumentException thickness = assertThrows(IllegalArgumentException.class,
                () -> new UnitSlice("Sand C", LithologyClass.RESERVOIR, true, -1, 0.1));
        assertTrue(thickness.getMessage().contains("Sand C") && thickness.getMessage().contains("thickness"));
        IllegalArgumentException vcl = assertThrows(IllegalArgumentException.class,
                () -> new UnitSlice("Shale D", LithologyClass.SEAL, false, 10, 1.2));
        assertTrue(vcl.getMessage().contains("clay fraction"));
        assertThrows(IllegalArgumentException.class,
                () -> new UnitSlice("Sand E", LithologyClass.RESERVOIR, true, Double.NaN, 0.1));
        assertThrows(IllegalArgumentException.class, () -> new ResolvedColumn(List.of()));
    }
}
