package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WorldFileTest {
    @TempDir
    Path dir;

    // A north-up map at 2.5 m per pixel whose upper-left pixel centre sits at (500000, 6000000).
    // World-file layout (line order A, D, B, E, C, F; C/F = centre of the upper-left pixel): ESRI,
    // "World files for raster datasets" help page (from memory); common practice.
    private final WorldFile northUp = new WorldFile(2.5, 0, 0, -2.5, 500000, 6000000);

    @Test
    void upperLeftPixelCentreMapsToCAndF() {
        assertArrayEquals(new double[] { 500000, 6000000 }, northUp.toMap(0, 0), 1e-9);
        // one pixel right and two down: x grows by A, y by 2·E
        assertArrayEquals(new double[] { 500002.5, 5999995 }, northUp.toMap(1, 2), 1e-9);
    }

    @Test
    void inverseOfARotatedTransformReturnsThePixel() {
        double angle = Math.toRadians(12);
        WorldFile rotated = new WorldFile(2 * Math.cos(angle), 2 * Math.sin(angle), 2 * Math.sin(angle),
                -2 * Math.cos(angle), 1000, 2000);
        double[] xy = rotated.toMap(123.25, 456.5);
        assertArrayEquals(new double[] { 123.25, 456.5 }, rotated.toPixel(xy[0], xy[1]), 1e-9);
    }

    @Test
    void writeThenReadRoundTrips() throws IOException {
        Path file = dir.resolve("map.pgw");
        northUp.write(file);
        assertEquals(6, Files.readAllLines(file).size());
        assertEquals(northUp, WorldFile.read(file));
    }

    @Test
    void badLineIsReportedWithFileAndLine() throws IOException {
        Path file = dir.resolve("bad.tfw");
        Files.writeString(file, "2.5\n0\n0\nminus two\n500000\n6000000\n");
        IOException e = assertThrows(IOException.class, () -> WorldFile.read(file));
        assertTrue(e.getMessage().contains("bad.tfw") && e.getMessage().contains("line 4"), e.getMessage());
    }

    @Test
    void singularTransformIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new WorldFile(1, 1, 1, 1, 0, 0));
    }
}
