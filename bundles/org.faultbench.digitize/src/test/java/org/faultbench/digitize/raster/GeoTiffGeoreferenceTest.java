package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.plugins.tiff.GeoTIFFTagSet;
import javax.imageio.stream.ImageInputStream;

import org.faultbench.digitize.georef.WorldFile;
import org.faultbench.digitize.raster.GeoTiffGeoreference.RasterSpace;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * GeoTIFF raster-to-model transforms per the GeoTIFF Format Specification rev. 1.0 (Ritter &amp; Ruth 1995) sec.
 * 2.6.1 (ModelTiepoint + ModelPixelScale; ModelTransformation as a row-major 4×4 matrix) and sec. 2.5.2.2
 * (PixelIsArea: raster (0, 0) is the upper-left corner of the upper-left pixel), also OGC GeoTIFF 1.1 (2019); from
 * memory. World file C, F = centre of the upper-left pixel: ESRI world file help (from memory). Expected values are
 * hand calculations.
 */
class GeoTiffGeoreferenceTest {
    private static final double EXACT = 1e-9;
    private static final double[] SCALE = { 2.5, 2.5, 0 };
    private static final double[] TIEPOINT_AT_ORIGIN = { 0, 0, 0, 500000, 6000000, 0 };
    // raster key 1025 (GTRasterTypeGeoKey) = 2 (RasterPixelIsPoint); header version 1, revision 1.0, 1 key
    private static final char[] PIXEL_IS_POINT_KEYS = { 1, 1, 0, 1, 1025, 0, 1, 2 };

    @TempDir
    Path dir;

    @Test
    void pixelIsAreaTiepointMovesHalfAPixelToTheCentre() {
        WorldFile world = GeoTiffGeoreference.fromScaleAndTiepoint(SCALE, TIEPOINT_AT_ORIGIN,
                RasterSpace.PIXEL_IS_AREA);
        // C = 500000 + 0.5·2.5 = 500001.25; F = 6000000 − 0.5·2.5 = 5999998.75 (hand calculation)
        assertEquals(new WorldFile(2.5, 0, 0, -2.5, 500001.25, 5999998.75), world);
    }

    @Test
    void pixelIsPointTiepointIsAlreadyThePixelCentre() {
        WorldFile world = GeoTiffGeoreference.fromScaleAndTiepoint(SCALE, TIEPOINT_AT_ORIGIN,
                RasterSpace.PIXEL_IS_POINT);
        assertEquals(new WorldFile(2.5, 0, 0, -2.5, 500000, 6000000), world);
    }

    @Test
    void tiepointAwayFromTheOriginIsCarriedBackToPixelZero() {
        // raster (100, 40) ↔ (1000, 2000), 2 m × 4 m pixels: corner (0, 0) at (800, 2160), centre (801, 2158)
        WorldFile world = GeoTiffGeoreference.fromScaleAndTiepoint(new double[] { 2, 4, 0 },
                new double[] { 100, 40, 0, 1000, 2000, 0 }, RasterSpace.PIXEL_IS_AREA);
        assertArrayEquals(new double[] { 801, 2158 }, world.toMap(0, 0), EXACT);
        // the tie point itself is the corner of pixel (100, 40), i.e. pixel coordinates (99.5, 39.5)
        assertArrayEquals(new double[] { 1000, 2000 }, world.toMap(99.5, 39.5), EXACT);
    }

    @Test
    void rotatedModelTransformationKeepsItsLinearPart() {
        double cos = Math.cos(Math.toRadians(30));
        double sin = Math.sin(Math.toRadians(30));
        double[] matrix = { 2 * cos, 2 * sin, 0, 1000, 2 * sin, -2 * cos, 0, 5000, 0, 0, 0, 0, 0, 0, 0, 1 };
        WorldFile world = GeoTiffGeoreference.fromModelTransformation(matrix, RasterSpace.PIXEL_IS_AREA);
        // pixel (0, 0) centre = raster (0.5, 0.5): x = 1000 + (2cos + 2sin)/2, y = 5000 + (2sin − 2cos)/2
        assertArrayEquals(new double[] { 1000 + cos + sin, 5000 + sin - cos }, world.toMap(0, 0), EXACT);
        assertEquals(2 * cos, world.a(), EXACT);
        assertEquals(2 * sin, world.b(), EXACT);
        assertEquals(2 * sin, world.d(), EXACT);
        assertEquals(-2 * cos, world.e(), EXACT);
    }

    @Test
    void tooShortTagIsRejectedNamingTheTag() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GeoTiffGeoreference.fromScaleAndTiepoint(SCALE, new double[] { 0, 0, 0, 1 },
                        RasterSpace.PIXEL_IS_AREA));
        assertTrue(e.getMessage().contains("ModelTiepoint"), e.getMessage());
    }

    @Test
    void tagsWrittenIntoATiffAreReadBackFromItsMetadata() throws IOException {
        Path tiff = TestImages.writeGeoTiff(dir.resolve("scan.tif"), TestImages.rgbPattern(8, 6),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_PIXEL_SCALE, SCALE),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_TIE_POINT, TIEPOINT_AT_ORIGIN));
        assertEquals(Optional.of(new WorldFile(2.5, 0, 0, -2.5, 500001.25, 5999998.75)), readTags(tiff));
    }

    @Test
    void pixelIsPointKeyInTheFileSuppressesTheHalfPixelShift() throws IOException {
        Path tiff = TestImages.writeGeoTiff(dir.resolve("point.tif"), TestImages.rgbPattern(8, 6),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_PIXEL_SCALE, SCALE),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_TIE_POINT, TIEPOINT_AT_ORIGIN),
                TestImages.shorts(GeoTIFFTagSet.TAG_GEO_KEY_DIRECTORY, PIXEL_IS_POINT_KEYS));
        assertEquals(Optional.of(new WorldFile(2.5, 0, 0, -2.5, 500000, 6000000)), readTags(tiff));
    }

    @Test
    void modelTransformationWinsOverScaleAndTiepoint() throws IOException {
        double[] matrix = { 1, 0, 0, 100, 0, -1, 0, 200, 0, 0, 0, 0, 0, 0, 0, 1 };
        Path tiff = TestImages.writeGeoTiff(dir.resolve("matrix.tif"), TestImages.rgbPattern(8, 6),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_TRANSFORMATION, matrix),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_PIXEL_SCALE, SCALE),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_TIE_POINT, TIEPOINT_AT_ORIGIN));
        assertEquals(Optional.of(new WorldFile(1, 0, 0, -1, 100.5, 199.5)), readTags(tiff));
    }

    @Test
    void plainTiffHasNoGeoreference() throws IOException {
        Path tiff = TestImages.write(TestImages.rgbPattern(8, 6), "tiff", dir.resolve("plain.tif"));
        assertEquals(Optional.empty(), readTags(tiff));
    }

    private static Optional<WorldFile> readTags(Path tiff) throws IOException {
        try (ImageInputStream in = ImageIO.createImageInputStream(tiff.toFile())) {
            ImageReader reader = ImageIO.getImageReaders(in).next();
            reader.setInput(in);
            IIOMetadata metadata = reader.getImageMetadata(0);
            reader.dispose();
            return GeoTiffGeoreference.fromMetadata(metadata);
        }
    }
}
