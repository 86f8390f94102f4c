package org.faultbench.core.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.units.PhysicalConstants;
import org.faultbench.core.units.PressureUnit;
import org.junit.jupiter.api.Test;

class BuoyancyTest {

    @Test
    void hundredMetreOilColumn() {
        Buoyancy oil = new Buoyancy(1050, 750, PhysicalConstants.G);
        // (1050 - 750) x 9.81 x 100 = 294.3 kPa = 2.943 bar = 42.7 psi (buoyancy equation, common practice; hand calc)
        assertEquals(294_300, oil.pressure(100), 1e-6);
        assertEquals(42.7, PressureUnit.PSI.fromPascals(oil.pressure(100)), 0.05);
        // with standard gravity 9.80665: 294.2 kPa (hand calculation)
        assertEquals(294.2, new Buoyancy(1050, 750, PhysicalConstants.STANDARD_GRAVITY).pressure(100) / 1000, 0.05);
        // gas 200 kg/m3: 850 x 9.81 x 100 = 833.9 kPa (hand calculation)
        assertEquals(833.9, new Buoyancy(1050, 200, PhysicalConstants.G).pressure(100) / 1000, 0.05);
    }

    @Test
    void columnSupportedByAThresholdPressure() {
        double threshold = PressureUnit.BAR.toPascals(1.7408);
        // h = P / (drho g): 174080 / (300 x 9.81) = 59.15 m; drho 400 -> 44.36 m; drho 700 -> 25.35 m (hand calc)
        assertEquals(59.15, new Buoyancy(1050, 750, 9.81).columnHeight(threshold), 0.005);
        assertEquals(44.36, new Buoyancy(1050, 650, 9.81).columnHeight(threshold), 0.005);
        assertEquals(25.35, new Buoyancy(1050, 350, 9.81).columnHeight(threshold), 0.005);
        // with standard gravity 9.80665: 59.17 m (hand calculation)
        assertEquals(59.17, new Buoyancy(1050, 750, 9.80665).columnHeight(threshold), 0.005);
        assertEquals(Double.POSITIVE_INFINITY, new Buoyancy(1050, 750, 9.81).columnHeight(Double.POSITIVE_INFINITY));
    }

    @Test
    void fromFluidsUsesTheDefaultGravity() {
        Buoyancy buoyancy = Buoyancy.of(Fluid.TYPICAL_OIL, Fluid.TYPICAL_BRINE);
        assertEquals(300, buoyancy.densityContrast(), 0);
        assertEquals(PhysicalConstants.G, buoyancy.gravity(), 0);
    }

    @Test
    void aFluidDenserThanWaterIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Buoyancy(1050, 1050, 9.81));
        assertTrue(e.getMessage().contains("must be below the water density"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Buoyancy(1050, Double.NaN, 9.81));
        assertThrows(IllegalArgumentException.class, () -> new Buoyancy(1050, 750, 0));
        Buoyancy oil = new Buoyancy(1050, 750, 9.81);
        assertThrows(IllegalArgumentException.class, () -> oil.pressure(-1));
        assertThrows(IllegalArgumentException.class, () -> oil.columnHeight(Double.NaN));
    }
}
