package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SimilarityTransformTest {

    @Test
    void northUpScanIsTheUsualWorldFile() {
        // θ = 0: A = s, B = D = 0, E = −s, C/F = pixel (0, 0); world-file layout: ESRI help "World files for raster
        // datasets" (from memory); common practice
        WorldFile file = new SimilarityTransform(2.5, 0, 500000, 6000000).worldFile();
        assertEquals(new WorldFile(2.5, 0, 0, -2.5, 500000, 6000000), file);
    }

    @Test
    void quarterTurnSendsImageDownToMapEast() {
        // hand calculation: s = 1, θ = 90°: x = row + 100, y = col + 200, so pixel (0, 100) → (200, 200)
        SimilarityTransform t = new SimilarityTransform(1, Math.PI / 2, 100, 200);
        assertArrayEquals(new double[] { 200, 200 }, t.toMap(0, 100), 1e-12);
        assertArrayEquals(new double[] { 100, 300 }, t.toMap(100, 0), 1e-12);
        assertArrayEquals(new double[] { 0, 100 }, t.toPixel(200, 200), 1e-12);
    }

    @Test
    void nonPositiveScaleIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SimilarityTransform(0, 0, 0, 0));
        assertTrue(e.getMessage().contains("scale") && e.getMessage().contains("0.0"), e.getMessage());
    }
}
