package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.function.IntBinaryOperator;

import javax.imageio.ImageIO;
import javax.imageio.ImageReadParam;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImagePyramidTest {
    private static final PyramidSettings SMALL_TILES = new PyramidSettings(64, 1);
    /** Grey constant over aligned 4×4 blocks, so box means at levels 1 and 2 equal plain subsampling. */
    private static final IntBinaryOperator BLOCKS = (x, y) -> ((x >> 2) * 7 + (y >> 2) * 13) & 0xFF;

    @TempDir
    Path dir;

    @Test
    void levelZeroHoldsTheGreyValuesOfTheFileExactly() throws IOException {
        Path png = dir.resolve("blocks.png");
        SyntheticPng.writeGrey(png, 600, 300, BLOCKS);
        ImagePyramid pyramid = build(png, TileStore.inMemory());
        assertEquals(5, pyramid.levelCount()); // 600 → 300 → 150 → 75 → 38 ≤ 64
        BufferedImage level0 = pyramid.region(0, 0, 0, 600, 300);
        for (int y = 0; y < 300; y++) {
            for (int x = 0; x < 600; x++) {
                int grey = BLOCKS.applyAsInt(x, y);
                assertEquals(0xFF000000 | grey * 0x010101, level0.getRGB(x, y), "pixel " + x + "," + y);
            }
        }
    }

    @Test
    void levelsOneAndTwoEqualADirectSubsampledReadOfABlockConstantImage() throws IOException {
        Path png = dir.resolve("blocks.png");
        SyntheticPng.writeGrey(png, 600, 300, BLOCKS);
        ImagePyramid pyramid = build(png, TileStore.inMemory());
        for (int level = 1; level <= 2; level++) {
            BufferedImage expected = subsampledRead(png, 1 << level);
            assertEquals(expected.getWidth(), pyramid.levelWidth(level));
            assertEquals(expected.getHeight(), pyramid.levelHeight(level));
            BufferedImage actual = pyramid.region(level, 0, 0, expected.getWidth(), expected.getHeight());
            for (int y = 0; y < expected.getHeight(); y++) {
                for (int x = 0; x < expected.getWidth(); x++) {
                    assertEquals(expected.getRaster().getSample(x, y, 0), actual.getRGB(x, y) & 0xFF,
                            "level " + level + " pixel " + x + "," + y);
                }
            }
        }
    }

    @Test
    void levelOneOfAGradientIsTheRoundedPairMean() throws IOException {
        Path png = dir.resolve("gradient.png");
        SyntheticPng.writeGrey(png, 256, 70, (x, y) -> x);
        ImagePyramid pyramid = build(png, TileStore.inMemory());
        BufferedImage level1 = pyramid.region(1, 0, 0, 128, 35);
        for (int x = 0; x < 128; x++) {
            // mean of 2x and 2x + 1 is 2x + 0.5, rounded half up to 2x + 1 (hand calculation)
            assertEquals(2 * x + 1, level1.getRGB(x, 17) & 0xFF, "column " + x);
        }
    }

    @Test
    void oneBlackPixelLineSurvivesAtLevelOneAsMidGrey() throws IOException {
        Path png = dir.resolve("line.png");
        SyntheticPng.writeGrey(png, 100, 100, (x, y) -> x == 5 ? 0 : 255);
        BufferedImage level1 = build(png, TileStore.inMemory()).tile(1, 0, 0);
        // columns 4 and 5: (255 + 0 + 255 + 0) / 4 = 127.5 → 128; column pairs without the line stay 255
        assertEquals(128, level1.getRGB(2, 10) & 0xFF);
        assertEquals(255, level1.getRGB(3, 10) & 0xFF);
    }

    @Test
    void colourFormatsKeepTheirPixelsAtLevelZero() throws IOException {
        BufferedImage source = TestImages.rgbPattern(150, 90);
        for (String format : List.of("png", "tiff", "bmp")) {
            Path file = TestImages.write(source, format, dir.resolve("colour." + format));
            BufferedImage level0 = build(file, TileStore.inMemory()).region(0, 0, 0, 150, 90);
            assertSamePixels(source, level0, format);
        }
    }

    @Test
    void jpegStripsDecodeLikeTheWholeImage() throws IOException {
        Path jpeg = TestImages.write(TestImages.rgbPattern(150, 90), "jpeg", dir.resolve("scan.jpg"));
        BufferedImage whole = ImageIO.read(jpeg.toFile());
        assertSamePixels(whole, build(jpeg, TileStore.inMemory()).region(0, 0, 0, 150, 90), "jpeg");
    }

    @Test
    void regionAcrossTilesMatchesTheSourceAndIsTransparentOutside() throws IOException {
        BufferedImage source = TestImages.rgbPattern(150, 90);
        Path png = TestImages.write(source, "png", dir.resolve("colour.png"));
        ImagePyramid pyramid = build(png, TileStore.inMemory());
        BufferedImage region = pyramid.region(0, 60, 50, 100, 50);
        assertEquals(source.getRGB(60, 50), region.getRGB(0, 0));
        assertEquals(source.getRGB(64, 64), region.getRGB(4, 14)); // first pixel of tile (1, 1)
        assertEquals(source.getRGB(149, 89), region.getRGB(89, 39));
        assertEquals(0, region.getRGB(90, 39), "beyond the right edge");
        assertEquals(0, region.getRGB(0, 40), "below the bottom edge");
        assertEquals(0, pyramid.region(0, -10, -10, 5, 5).getRGB(2, 2), "wholly outside");
    }

    @Test
    void edgeTilesAreTheRemainderSize() throws IOException {
        Path png = TestImages.write(TestImages.rgbPattern(150, 90), "png", dir.resolve("colour.png"));
        BufferedImage corner = build(png, TileStore.inMemory()).tile(0, 2, 1);
        assertEquals(150 - 128, corner.getWidth());
        assertEquals(90 - 64, corner.getHeight());
    }

    @Test
    void directoryStoreHoldsOnePngPerTileAndGivesTheSamePixels() throws IOException {
        Path png = dir.resolve("blocks.png");
        SyntheticPng.writeGrey(png, 300, 200, BLOCKS);
        Path cache = dir.resolve("cache");
        ImagePyramid onDisk = build(png, TileStore.inDirectory(cache));
        ImagePyramid inMemory = build(png, TileStore.inMemory());
        long files;
        try (var walk = Files.walk(cache)) {
            files = walk.filter(p -> p.toString().endsWith(".png")).count();
        }
        assertEquals(onDisk.layout().totalTiles(), files);
        for (int level = 0; level < onDisk.levelCount(); level++) {
            assertSamePixels(inMemory.region(level, 0, 0, inMemory.levelWidth(level), inMemory.levelHeight(level)),
                    onDisk.region(level, 0, 0, onDisk.levelWidth(level), onDisk.levelHeight(level)),
                    "level " + level);
        }
    }

    @Test
    void progressCountsEveryTileAndCancellationStopsTheBuild() throws IOException {
        Path png = dir.resolve("blocks.png");
        SyntheticPng.writeGrey(png, 300, 200, BLOCKS);
        RasterSource source = RasterSource.open(png);
        List<Integer> reports = new ArrayList<>();
        ImagePyramid.build(source, SMALL_TILES, TileStore.inMemory(), new BuildProgress() {
            @Override
            public void tilesDone(int done, int total) {
                assertEquals(20 + 6 + 2 + 1, total); // 5·4 + 3·2 + 2·1 + 1·1 tiles of 64 px
                reports.add(done);
            }

            @Override
            public boolean isCancelled() {
                return false;
            }
        });
        assertEquals(29, reports.size());
        assertEquals(29, reports.get(reports.size() - 1));

        List<Integer> beforeCancel = new ArrayList<>();
        CancellationException e = assertThrows(CancellationException.class,
                () -> ImagePyramid.build(source, SMALL_TILES, TileStore.inMemory(), new BuildProgress() {
                    @Override
                    public void tilesDone(int done, int total) {
                        beforeCancel.add(done);
                    }

                    @Override
                    public boolean isCancelled() {
                        return beforeCancel.size() >= 3;
                    }
                }));
        assertEquals(3, beforeCancel.size());
        assertTrue(e.getMessage().contains("3 of 29"), e.getMessage());
    }

    @Test
    void badTileAddressIsRejected() throws IOException {
        Path png = TestImages.write(TestImages.rgbPattern(150, 90), "png", dir.resolve("colour.png"));
        ImagePyramid pyramid = build(png, TileStore.inMemory());
        assertThrows(IllegalArgumentException.class, () -> pyramid.tile(0, 3, 0));
        assertThrows(IllegalArgumentException.class, () -> pyramid.tile(pyramid.levelCount(), 0, 0));
        assertThrows(IllegalArgumentException.class, () -> pyramid.region(0, 0, 0, 0, 10));
    }

    private ImagePyramid build(Path file, TileStore store) throws IOException {
        return ImagePyramid.build(RasterSource.open(file), SMALL_TILES, store, BuildProgress.NONE);
    }

    private static BufferedImage subsampledRead(Path file, int step) throws IOException {
        try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
            ImageReader reader = ImageIO.getImageReaders(in).next();
            reader.setInput(in);
            ImageReadParam param = reader.getDefaultReadParam();
            param.setSourceSubsampling(step, step, 0, 0);
            BufferedImage image = reader.read(0, param);
            reader.dispose();
            return image;
        }
    }

    private static void assertSamePixels(BufferedImage expected, BufferedImage actual, String what) {
        assertEquals(new Rectangle(expected.getWidth(), expected.getHeight()),
                new Rectangle(actual.getWidth(), actual.getHeight()), what);
        for (int y = 0; y < expected.getHeight(); y++) {
            for (int x = 0; x < expected.getWidth(); x++) {
                assertEquals(expected.getRGB(x, y), actual.getRGB(x, y), what + " pixel " + x + "," + y);
            }
        }
    }
}
