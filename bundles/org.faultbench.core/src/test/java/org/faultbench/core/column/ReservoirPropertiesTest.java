package org.faultbench.core.column;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.faultbench.core.units.VolumeUnit;
import org.junit.jupiter.api.Test;

class ReservoirPropertiesTest {

    @Test
    void stockTankOilInPlaceOfAGrossRockVolume() {
        ReservoirProperties properties = new ReservoirProperties(0.7, 0.20, 0.30, 1.2);
        double stoiip = 1.0e8 * properties.stockTankOilPerRockVolume();
        // STOIIP = GRV x N/G x phi x (1 - Sw) / Bo = 1e8 x 0.7 x 0.2 x 0.7 / 1.2 = 8.1667e6 m3 = 51.37 MMstb
        // (volumetric equation, common practice; hand calculation)
        assertEquals(8.1667e6, stoiip, 50);
        assertEquals(51.37e6, VolumeUnit.BARREL.fromCubicMetres(stoiip), 0.005e6);
    }

    @Test
    void outOfRangeValuesAreRejectedNamingTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ReservoirProperties(0.7, 1.2, 0.3, 1.2));
        assertEquals("porosity must be in [0, 1], was 1.2", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new ReservoirProperties(Double.NaN, 0.2, 0.3, 1.2));
        assertThrows(IllegalArgumentException.class, () -> new ReservoirProperties(0.7, 0.2, -0.1, 1.2));
        assertThrows(IllegalArgumentException.class, () -> new ReservoirProperties(0.7, 0.2, 0.3, 0.99));
    }
}
