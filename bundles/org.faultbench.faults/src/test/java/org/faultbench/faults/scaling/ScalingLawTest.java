package org.faultbench.faults.scaling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ScalingLawTest {

    @Test
    void schlischeLawGives300MetresOn10Kilometres() {
        // Schlische et al. 1996, Geology 24: D = 0.03 L; L = 10 km -> 300 m
        assertEquals(300, ScalingLaws.SCHLISCHE_1996.displacementAt(10_000), 1e-9);
    }

    @Test
    void publishedConstantsAreThoseOfThePapers() {
        // Lathrop et al. 2022, Front. Earth Sci. 10:907543, abstract: D = 0.3 L^0.92 (units to verify)
        assertEquals(0.3, ScalingLaws.LATHROP_2022.c(), 0);
        assertEquals(0.92, ScalingLaws.LATHROP_2022.n(), 0);
        // hand calculation: 0.3 * 1000^0.92 = 0.3 * 10^2.76 = 172.6 m
        assertEquals(172.6, ScalingLaws.LATHROP_2022.displacementAt(1000), 0.1);
        // Clark & Cox 1996, J. Struct. Geol. 18: n = 0.946 +/- 0.043; no coefficient recorded
        assertEquals(0.946, ScalingLaws.CLARK_COX_1996.n(), 0);
        assertFalse(ScalingLaws.CLARK_COX_1996.hasCoefficient());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ScalingLaws.CLARK_COX_1996.displacementAt(1000));
        assertTrue(e.getMessage().contains("only the exponent"), e.getMessage());
    }

    @Test
    void envelopeSpansOneThousandthToOneTenth() {
        // Cowie & Scholz 1992; Schultz et al. 2008 (from memory): D/L from 0.001 to 0.1
        ScalingEnvelope band = ScalingEnvelope.NORMAL_FAULTS;
        assertTrue(band.contains(300, 10_000), "Schlische et al. 1996's D/L = 0.03 lies inside");
        assertFalse(band.contains(5, 10_000), "D/L = 0.0005");
        assertFalse(band.contains(150, 1000), "D/L = 0.15");
        assertEquals(10, band.upper().displacementAt(100), 1e-12);
        assertEquals(5, ScalingLaws.all().size());
    }

    @Test
    void badConstantsAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> new ScalingLaw("x", -1, 1, "s"));
        assertThrows(IllegalArgumentException.class, () -> new ScalingLaw("x", 0.1, 0, "s"));
        assertThrows(IllegalArgumentException.class, () -> ScalingLaws.SCHLISCHE_1996.displacementAt(0));
    }
}
