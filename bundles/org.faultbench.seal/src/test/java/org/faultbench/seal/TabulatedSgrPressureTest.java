package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

class TabulatedSgrPressureTest {

    private final TabulatedSgrPressure table = new TabulatedSgrPressure(List.of(new SgrPressurePoint(10, 0),
            new SgrPressurePoint(20, 1e5), new SgrPressurePoint(40, 5e5)));

    @Test
    void interpolatesLinearlyBetweenRows() {
        // linear interpolation, hand calculation: halfway 10-20 % -> 0.5 bar; halfway 20-40 % -> 3 bar
        assertEquals(0.5e5, table.thresholdPressure(15, 2000), 1e-6);
        assertEquals(3e5, table.thresholdPressure(30, 2000), 1e-6);
        assertEquals(1e5, table.thresholdPressure(20, 9000), 1e-6, "burial depth is not used");
    }

    @Test
    void clampsOutsideTheTable() {
        assertEquals(0, table.thresholdPressure(5, 2000), 0);
        assertEquals(5e5, table.thresholdPressure(80, 2000), 0);
    }

    @Test
    void invalidTablesAreRejected() {
        IllegalArgumentException order = assertThrows(IllegalArgumentException.class,
                () -> new TabulatedSgrPressure(List.of(new SgrPressurePoint(20, 1e5), new SgrPressurePoint(20, 2e5))));
        assertEquals("SGR table row 2: SGR 20.0 % must be above the previous row's 20.0 %", order.getMessage());
        IllegalArgumentException falling = assertThrows(IllegalArgumentException.class,
                () -> new TabulatedSgrPressure(List.of(new SgrPressurePoint(10, 2e5), new SgrPressurePoint(20, 1e5))));
        assertEquals("SGR table row 2: pressure 100000.0 Pa must not be below the previous row's 200000.0 Pa",
                falling.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new TabulatedSgrPressure(List.of(new SgrPressurePoint(10, 0))));
        assertThrows(IllegalArgumentException.class, () -> new SgrPressurePoint(10, -1));
        assertThrows(IllegalArgumentException.class, () -> new SgrPressurePoint(101, 0));
        assertThrows(IllegalArgumentException.class, () -> table.thresholdPressure(-1, 2000));
    }
}
