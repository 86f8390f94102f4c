package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import javax.imageio.ImageIO;
import javax.imageio.plugins.tiff.GeoTIFFTagSet;

import org.faultbench.digitize.georef.WorldFile;
import org.faultbench.digitize.io.FormatException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RasterSourceTest {
    // north-up, 2.5 m pixels, upper-left pixel centre at (500000, 6000000); ESRI world file layout (from memory)
    private static final WorldFile NORTH_UP = new WorldFile(2.5, 0, 0, -2.5, 500000, 6000000);

    @TempDir
    Path dir;

    @Test
    void sizeComesFromTheHeaderWithoutDecodingPixels() throws IOException {
        // 50,000 × 40,000 px claimed, but the file holds no pixel data: decoding it would fail, and would need
        // 8 GB as ARGB; opening reads the header only.
        Path png = dir.resolve("huge.png");
        SyntheticPng.writeHeaderOnly(png, 50_000, 40_000);
        RasterSource source = RasterSource.open(png);
        assertEquals(50_000, source.width());
        assertEquals(40_000, source.height());
        assertEquals(RasterFormat.PNG, source.format());
        assertEquals(GeoreferenceOrigin.NONE, source.georeferenceOrigin());
        assertThrows(IOException.class, () -> ImageIO.read(png.toFile()), "the file really has no pixels");
    }

    @ParameterizedTest
    @CsvSource({ "png, scan.png, scan.pgw, PNG", "jpeg, scan.jpg, scan.jgw, JPEG", "tiff, scan.tif, scan.tfw, TIFF",
            "bmp, scan.bmp, scan.bpw, BMP" })
    void eachFormatOpensWithItsWorldFile(String writerName, String image, String worldFile, RasterFormat format)
            throws IOException {
        Path file = TestImages.write(TestImages.rgbPattern(30, 20), writerName, dir.resolve(image));
        NORTH_UP.write(dir.resolve(worldFile));
        RasterSource source = RasterSource.open(file);
        assertEquals(new RasterSource(file, format, 30, 20, Optional.of(NORTH_UP), GeoreferenceOrigin.WORLD_FILE),
                source);
    }

    @Test
    void formatIsRecognisedFromContentNotExtension() throws IOException {
        Path file = TestImages.write(TestImages.rgbPattern(5, 4), "bmp", dir.resolve("misnamed.png"));
        assertEquals(RasterFormat.BMP, RasterSource.open(file).format());
    }

    @Test
    void geoTiffTagsGeoreferenceATiffWithoutWorldFile() throws IOException {
        Path tiff = TestImages.writeGeoTiff(dir.resolve("geo.tif"), TestImages.rgbPattern(8, 6),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_PIXEL_SCALE, 2.5, 2.5, 0),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_TIE_POINT, 0, 0, 0, 499998.75, 6000001.25, 0));
        RasterSource source = RasterSource.open(tiff);
        // corner (499998.75, 6000001.25) + half a 2.5 m pixel = centre (500000, 6000000): GeoTIFF 1.0 sec. 2.5.2.2
        assertEquals(GeoreferenceOrigin.GEOTIFF_TAGS, source.georeferenceOrigin());
        assertEquals(Optional.of(NORTH_UP), source.worldFile());
    }

    @Test
    void worldFileBesideAGeoTiffWins() throws IOException {
        Path tiff = TestImages.writeGeoTiff(dir.resolve("geo.tif"), TestImages.rgbPattern(8, 6),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_PIXEL_SCALE, 10, 10, 0),
                TestImages.doubles(GeoTIFFTagSet.TAG_MODEL_TIE_POINT, 0, 0, 0, 0, 0, 0));
        NORTH_UP.write(dir.resolve("geo.tfw"));
        RasterSource source = RasterSource.open(tiff);
        assertEquals(GeoreferenceOrigin.WORLD_FILE, source.georeferenceOrigin());
        assertEquals(Optional.of(NORTH_UP), source.worldFile());
    }

    @Test
    void nonImageIsReportedWithTheFileName() throws IOException {
        Path text = dir.resolve("notes.png");
        Files.writeString(text, "not an image");
        FormatException e = assertThrows(FormatException.class, () -> RasterSource.open(text));
        assertTrue(e.getMessage().startsWith("notes.png:"), e.getMessage());
    }

    @Test
    void mismatchedOriginIsRejected() {
        Path file = dir.resolve("x.png");
        assertThrows(IllegalArgumentException.class, () -> new RasterSource(file, RasterFormat.PNG, 1, 1,
                Optional.empty(), GeoreferenceOrigin.WORLD_FILE));
        assertThrows(IllegalArgumentException.class, () -> new RasterSource(file, RasterFormat.PNG, 0, 1,
                Optional.empty(), GeoreferenceOrigin.NONE));
    }

    @Test
    void damagedTiffIsAFormatErrorNotARuntimeException() throws IOException {
        // found by ImageReaderFuzzTest (seed 20261202, input 463): the JDK's TIFF reader threw NullPointerException
        // on an IFD entry whose count runs past the end of the file
        byte[] tiff = {'M', 'M', 0, 42, 0, 0, 0, 8, 0, 12, 1, 0, 0, 3, 0, 0, 0, 1, 0, 24, 0, 0, 1, 1, 0, 3, 0, 0, 0,
            1, 0, 16, 0, 0, 1, 2, 0, 3, 0, 0, 0, 3, 0, 0, 0, (byte) 0xa0, 1, 3, 0, 3, 0, 0, 0, 1, 0, 1, 0, 0, 1, 6, 0,
            3, 0, 0, 0, 1, 0, 2, 0, 0, 1, 0x11, 0, 4, 0, 0, 0, 1};
        Path file = Files.write(dir.resolve("damaged.tif"), tiff);
        FormatException e = assertThrows(FormatException.class, () -> RasterSource.open(file));
        assertTrue(e.getMessage().startsWith("damaged.tif: "), e.getMessage());
    }
}
