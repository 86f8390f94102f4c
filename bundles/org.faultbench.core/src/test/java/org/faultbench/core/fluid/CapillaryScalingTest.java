package org.faultbench.core.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class CapillaryScalingTest {

    private static final CapillarySystem OIL_BRINE = new CapillarySystem("oil-brine", 0.030, 0);

    @Test
    void mercuryAirToOilBrine() {
        CapillaryScaling scaling = new CapillaryScaling(CapillarySystem.MERCURY_AIR, OIL_BRINE);
        // 30 cos 0 / (480 |cos 140|) = 30 / 367.70 = 0.0816 (Purcell 1949; Schowalter 1979, values from memory)
        assertEquals(0.0816, scaling.factor(), 0.00005);
        assertEquals(0.0816 * 10e5, scaling.convert(10e5), 0.00005 * 10e5);
    }

    @Test
    void angleMayBeQuotedThroughEitherPhase() {
        CapillarySystem throughAir = new CapillarySystem("mercury-air", 0.480, 40);
        // cos 40 = |cos 140| (trigonometry)
        assertEquals(CapillarySystem.MERCURY_AIR.wettingTerm(), throughAir.wettingTerm(), 1e-15);
    }

    @Test
    void oilBrineCalibrationToCo2Brine() {
        CapillarySystem co2 = CapillarySystem.againstBrine(Fluid.TYPICAL_CO2);
        CapillarySystem oil = CapillarySystem.againstBrine(Fluid.TYPICAL_OIL);
        // 30 cos 30 / (30 cos 0) = 0.8660 (Purcell 1949 scaling; hand calculation)
        assertEquals(0.8660, new CapillaryScaling(oil, co2).factor(), 0.00005);
        assertEquals("CO2-brine", co2.name());
    }

    @Test
    void invalidSystemsAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> CapillarySystem.againstBrine(Fluid.TYPICAL_BRINE));
        assertThrows(IllegalArgumentException.class, () -> new CapillarySystem("x", 0.03, 90));
        assertThrows(IllegalArgumentException.class, () -> new CapillarySystem("x", 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new CapillarySystem("x", 0.03, 181));
        assertThrows(IllegalArgumentException.class, () -> new CapillaryScaling(null, OIL_BRINE));
        CapillaryScaling scaling = new CapillaryScaling(CapillarySystem.MERCURY_AIR, OIL_BRINE);
        assertThrows(IllegalArgumentException.class, () -> scaling.convert(-1));
    }
}
