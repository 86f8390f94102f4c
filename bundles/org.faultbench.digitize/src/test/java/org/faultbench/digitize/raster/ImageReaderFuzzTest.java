package org.faultbench.digitize.raster;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.fuzz.FuzzRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Mutated PNG, TIFF, BMP and JPEG scans, opened through {@link RasterSource} (header and georeference) and decoded
 * into an {@link ImagePyramid}, either work or raise {@link IOException}.
 */
class ImageReaderFuzzTest {
    @TempDir
    Path dir;

    @Test
    void images() throws IOException, InterruptedException {
        BufferedImage pattern = TestImages.rgbPattern(24, 16);
        List<byte[]> seeds = new ArrayList<>();
        for (String format : new String[] {"png", "tif", "bmp", "jpg"}) {
            seeds.add(Files.readAllBytes(TestImages.write(pattern, format, dir.resolve("seed." + format))));
        }
        Path file = dir.resolve("scan.img");
        System.out.println(FuzzRun.run("images", 800, seeds, IOException.class, in -> {
            Files.write(file, in);
            RasterSource source = RasterSource.open(file);
            if ((long) source.width() * source.height() <= 1 << 20) {
                ImagePyramid.build(source, PyramidSettings.DEFAULT, new MemoryTileStore(), BuildProgress.NONE);
            }
        }));
    }
}
