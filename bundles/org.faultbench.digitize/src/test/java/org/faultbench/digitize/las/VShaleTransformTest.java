package org.faultbench.digitize.las;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Vsh from the gamma-ray index. Larionov 1969 (Borehole Radiometry, Nedra), as given in Asquith &amp; Krygowski
 * 2004, Basic Well Log Analysis, AAPG Methods in Exploration 16, ch. 3 (from memory): Tertiary Vsh = 0.083
 * (2^(3.7 IGR) - 1), older rocks Vsh = 0.33 (2^(2 IGR) - 1). Values below are hand calculations of those forms.
 */
class VShaleTransformTest {
    private static final double HAND = 1e-4;

    @Test
    void larionovTertiaryValues() {
        // 0.083 (2^1.85 - 1) = 0.083 x 2.6050 = 0.2162 (hand calculation; 2^1.85 = 10^0.55691 = 3.6050)
        assertEquals(0.2162, VShaleTransform.LARIONOV_TERTIARY.vshale(0.5), HAND);
        // 0.083 (2^0.925 - 1) = 0.083 x 0.8987 = 0.0746
        assertEquals(0.0746, VShaleTransform.LARIONOV_TERTIARY.vshale(0.25), HAND);
        // 0.083 (2^3.7 - 1) = 0.083 x 11.996 = 0.9957: the transform is built to give about 1 at IGR 1
        assertEquals(0.9957, VShaleTransform.LARIONOV_TERTIARY.vshale(1), HAND);
        assertEquals(0, VShaleTransform.LARIONOV_TERTIARY.vshale(0), 1e-12);
    }

    @Test
    void larionovOlderRocksValues() {
        // 0.33 (2^1 - 1) = 0.33
        assertEquals(0.33, VShaleTransform.LARIONOV_OLDER_ROCKS.vshale(0.5), HAND);
        // 0.33 (2^0.5 - 1) = 0.33 x 0.41421 = 0.1367
        assertEquals(0.1367, VShaleTransform.LARIONOV_OLDER_ROCKS.vshale(0.25), HAND);
        // 0.33 (2^2 - 1) = 0.99
        assertEquals(0.99, VShaleTransform.LARIONOV_OLDER_ROCKS.vshale(1), HAND);
    }

    @Test
    void larionovGivesLessShaleThanLinearInBetween() {
        for (double igr = 0.05; igr < 0.95; igr += 0.05) {
            double linear = VShaleTransform.LINEAR.vshale(igr);
            assertTrue(VShaleTransform.LARIONOV_TERTIARY.vshale(igr) < linear, "IGR " + igr);
            assertTrue(VShaleTransform.LARIONOV_OLDER_ROCKS.vshale(igr) < linear, "IGR " + igr);
        }
    }

    @Test
    void logIsTransformedThroughTheIndex() {
        GammaRayIndex baselines = new GammaRayIndex(30, 120);
        double[] gammaRay = { 30, 75, 120, 150, Double.NaN, 10 };
        // IGR: 0, 45/90 = 0.5, 1, clipped 1, NaN, clipped 0
        assertArrayEquals(new double[] { 0, 0.5, 1, 1, Double.NaN, 0 },
                VShaleTransform.LINEAR.vshaleLog(gammaRay, baselines), 1e-12);
        assertArrayEquals(new double[] { 0, 0.33, 0.99, 0.99, Double.NaN, 0 },
                VShaleTransform.LARIONOV_OLDER_ROCKS.vshaleLog(gammaRay, baselines), 1e-12);
    }

    @Test
    void indexOutsideZeroToOneIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> VShaleTransform.LARIONOV_TERTIARY.vshale(1.2));
        assertEquals("gamma-ray index must be in [0, 1], was 1.2", e.getMessage());
        assertTrue(Double.isNaN(VShaleTransform.LINEAR.vshale(Double.NaN)));
    }
}
