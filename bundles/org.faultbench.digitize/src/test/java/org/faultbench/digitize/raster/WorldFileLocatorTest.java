package org.faultbench.digitize.raster;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * World-file naming: ESRI, "World files for raster datasets", ArcGIS help (from memory): first and last letters of
 * the image extension plus "w" (.tfw, .jgw, .pgw, .bpw), or the whole extension plus "w" (.tifw, .jpgw), or .wld.
 */
class WorldFileLocatorTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0} with {1}")
    @CsvSource({
            "map.png, map.pgw, PNG", "map.png, map.pngw, PNG", "map.png, map.wld, PNG",
            "map.jpg, map.jgw, JPEG", "map.jpg, map.jpgw, JPEG", "map.jpeg, map.jgw, JPEG", "map.jpg, map.wld, JPEG",
            "map.tif, map.tfw, TIFF", "map.tif, map.tifw, TIFF", "map.tiff, map.tfw, TIFF", "map.tif, map.wld, TIFF",
            "map.bmp, map.bpw, BMP", "map.bmp, map.bmpw, BMP", "map.bmp, map.wld, BMP",
            "MAP.TIF, MAP.TFW, TIFF", "MAP.TIF, map.tfw, TIFF", "map.png, map.PGW, PNG", "scan.v2.png, scan.v2.pgw, PNG" })
    void findsTheWorldFileForEachExtension(String image, String worldFile, RasterFormat format) throws IOException {
        Files.createFile(dir.resolve(image));
        Files.createFile(dir.resolve(worldFile));
        assertEquals(Optional.of(dir.resolve(worldFile)), WorldFileLocator.find(dir.resolve(image), format));
    }

    @Test
    void formatSpecificExtensionWinsOverWld() throws IOException {
        Files.createFile(dir.resolve("map.tif"));
        Files.createFile(dir.resolve("map.wld"));
        Files.createFile(dir.resolve("map.tfw"));
        assertEquals(Optional.of(dir.resolve("map.tfw")), WorldFileLocator.find(dir.resolve("map.tif"),
                RasterFormat.TIFF));
    }

    @Test
    void worldFileOfAnotherFormatOrBaseNameIsIgnored() throws IOException {
        Files.createFile(dir.resolve("map.png"));
        Files.createFile(dir.resolve("map.tfw"));
        Files.createFile(dir.resolve("other.pgw"));
        Files.createFile(dir.resolve("map.png.pgw"));
        assertEquals(Optional.empty(), WorldFileLocator.find(dir.resolve("map.png"), RasterFormat.PNG));
    }
}
