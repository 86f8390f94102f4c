package org.faultbench.digitize.las;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** IGR = (GR - GRclean) / (GRshale - GRclean) clipped to [0, 1] (Asquith & Krygowski 2004, ch. 3; from memory). */
class GammaRayIndexTest {

    @Test
    void indexIsLinearBetweenTheBaselinesAndClipped() {
        GammaRayIndex index = new GammaRayIndex(20, 140);
        // (80 - 20) / 120 = 0.5; (50 - 20) / 120 = 0.25
        assertEquals(0.5, index.at(80), 1e-12);
        assertEquals(0.25, index.at(50), 1e-12);
        assertEquals(0, index.at(5), 1e-12);
        assertEquals(1, index.at(200), 1e-12);
        assertTrue(Double.isNaN(index.at(Double.NaN)));
    }

    @Test
    void baselinesFromPercentilesIgnoreNulls() {
        double[] gammaRay = new double[102];
        for (int k = 0; k < 100; k++) {
            gammaRay[k] = k + 1;
        }
        gammaRay[100] = Double.NaN;
        gammaRay[101] = Double.NaN;
        GammaRayIndex index = GammaRayIndex.fromPercentiles(gammaRay, 5, 95);
        // commons-math default estimate at position p (n + 1) / 100 (Hyndman & Fan 1996, definition 6; from
        // memory): readings 1..100, p 5 -> position 5.05 -> 5.05; p 95 -> position 95.95 -> 95.95
        assertEquals(5.05, index.clean(), 1e-9);
        assertEquals(95.95, index.shale(), 1e-9);
    }

    @Test
    void badBaselinesAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new GammaRayIndex(100, 100));
        assertEquals("gamma-ray baselines must be finite with shale > clean, was clean 100.0, shale 100.0",
                e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> GammaRayIndex.fromPercentiles(new double[] { Double.NaN }, 5, 95));
        assertThrows(IllegalArgumentException.class, () -> GammaRayIndex.fromPercentiles(new double[] { 1 }, 95, 5));
    }
}
