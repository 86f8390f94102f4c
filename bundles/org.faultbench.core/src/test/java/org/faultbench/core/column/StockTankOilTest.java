package org.faultbench.core.column;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.faultbench.core.units.VolumeUnit;
import org.junit.jupiter.api.Test;

class StockTankOilTest {

    @Test
    void stockTankOilFromGrossRockVolume() {
        // STOIIP = GRV N/G phi (1 - Sw) / Bo = 1e8 * 0.7 * 0.2 * 0.7 / 1.2 = 8.1667e6 m3 = 51.37 MMstb
        // (common practice volumetric formula; hand calculation; 1 m3 = 6.2898 bbl)
        double stoiip = new ReservoirProperties(0.7, 0.2, 0.3, 1.2).stockTankOil(1e8);
        assertEquals(8.1667e6, stoiip, 50);
        assertEquals(51.37e6, VolumeUnit.BARREL.fromCubicMetres(stoiip), 0.005e6);
    }

    @Test
    void negativeRockVolumeIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ReservoirProperties(0.7, 0.2, 0.3, 1.2).stockTankOil(-1));
        assertEquals("gross rock volume must be a finite number >= 0 m3, was -1.0", e.getMessage());
    }
}
