package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.column.ResolvedColumn;
import org.junit.jupiter.api.Test;

class FaultPointContextTest {

    private final ResolvedColumn column = TestColumns.sandShaleSand();

    @Test
    void hangingWallRockSitsThrowHigherInTheColumn() {
        FaultPointContext ctx = TestColumns.point(column, 100, 60);
        assertEquals(40, ctx.hangingWallPosition(), 0);
        assertTrue(ctx.reservoirAgainstReservoir());
        assertFalse(TestColumns.point(column, 140, 5).reservoirAgainstReservoir(), "below the column");
    }

    @Test
    void invalidInputsAreRejectedWithTheirValue() {
        IllegalArgumentException negativeThrow = assertThrows(IllegalArgumentException.class,
                () -> new FaultPointContext(2000, -1, 100, column, 2000));
        assertEquals("fault point: throw must be a finite number >= 0 m, was -1.0", negativeThrow.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new FaultPointContext(Double.NaN, 1, 100, column, 2000));
        assertThrows(IllegalArgumentException.class, () -> new FaultPointContext(2000, 1, Double.NaN, column, 2000));
        assertThrows(IllegalArgumentException.class, () -> new FaultPointContext(2000, 1, 100, null, 2000));
        assertThrows(IllegalArgumentException.class, () -> new FaultPointContext(2000, 1, 100, column, -5));
    }
}
