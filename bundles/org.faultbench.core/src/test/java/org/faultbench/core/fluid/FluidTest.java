package org.faultbench.core.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class FluidTest {

    @Test
    void presetsAreEditableCopies() {
        Fluid heavierOil = Fluid.TYPICAL_OIL.withDensity(850);
        assertEquals(850, heavierOil.density(), 0);
        assertEquals(750, Fluid.TYPICAL_OIL.density(), 0);
        assertEquals(0.025, Fluid.TYPICAL_CO2.withInterfacialTension(0.025).interfacialTension(), 0);
        assertEquals(20, Fluid.TYPICAL_CO2.withContactAngle(20).contactAngle(), 0);
        assertEquals(FluidKind.WATER, Fluid.TYPICAL_BRINE.kind());
    }

    @Test
    void invalidPropertiesAreRejectedNamingTheFluid() {
        IllegalArgumentException density = assertThrows(IllegalArgumentException.class,
                () -> Fluid.TYPICAL_GAS.withDensity(0));
        assertEquals("fluid 'gas': density must be a finite number > 0 kg/m3, was 0.0", density.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Fluid.TYPICAL_CO2.withContactAngle(95));
        assertThrows(IllegalArgumentException.class, () -> Fluid.TYPICAL_OIL.withInterfacialTension(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> new Fluid(" ", FluidKind.OIL, 800, 0.03, 0));
        assertThrows(IllegalArgumentException.class, () -> new Fluid("oil", null, 800, 0.03, 0));
    }
}
