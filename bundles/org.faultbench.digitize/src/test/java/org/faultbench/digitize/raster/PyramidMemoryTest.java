package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.function.IntBinaryOperator;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Measures the stated memory bound of {@link PyramidSettings} on a 6000 × 4500 grey scan (27 MB as 8-bit grey,
 * 108 MB if decoded whole as ARGB). The 12,000 × 9,000 case is measured by {@link PyramidMemoryBenchmark} in a JVM
 * with a small heap.
 */
class PyramidMemoryTest {
    private static final int WIDTH = 6000;
    private static final int HEIGHT = 4500;
    private static final IntBinaryOperator BLOCKS = (x, y) -> ((x >> 3) * 3 + (y >> 3) * 5) & 0xFF;

    @TempDir
    Path dir;

    @Test
    void liveHeapDuringTheBuildStaysWithinTheStatedBound() throws IOException {
        Path png = dir.resolve("scan.png");
        SyntheticPng.writeGrey(png, WIDTH, HEIGHT, BLOCKS);
        PyramidSettings settings = PyramidSettings.DEFAULT;
        HeapSampler sampler = new HeapSampler(8);

        ImagePyramid pyramid = ImagePyramid.build(RasterSource.open(png), settings,
                TileStore.inDirectory(dir.resolve("tiles")), sampler);

        long bound = settings.workingMemoryBound(WIDTH, 1);
        long wholeImageArgb = 4L * WIDTH * HEIGHT;
        assertTrue(sampler.samples() > 50, "samples " + sampler.samples());
        assertTrue(sampler.peakAboveBaseline() <= bound, "peak live heap " + sampler.peakAboveBaseline()
                + " B exceeds the stated bound " + bound + " B");
        assertTrue(bound < wholeImageArgb / 10, "bound " + bound + " B vs whole image " + wholeImageArgb + " B");
        // the pyramid is right, not just small: level 0 and level 3 (8×8 blocks are constant) match the pattern
        BufferedImage level0 = pyramid.region(0, 5990, 4490, 10, 10);
        assertEquals(BLOCKS.applyAsInt(5999, 4499), level0.getRGB(9, 9) & 0xFF);
        BufferedImage level3 = pyramid.region(3, 0, 0, pyramid.levelWidth(3), pyramid.levelHeight(3));
        assertEquals(750, level3.getWidth());
        for (int x = 0; x < 750; x += 37) {
            assertEquals(BLOCKS.applyAsInt(8 * x, 8 * 300), level3.getRGB(x, 300) & 0xFF, "level 3 column " + x);
        }
    }
}
