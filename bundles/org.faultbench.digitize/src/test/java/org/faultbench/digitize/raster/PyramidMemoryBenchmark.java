package org.faultbench.digitize.raster;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

/**
 * Builds the pyramid of a synthetic grey scan (default 12,000 × 9,000) and prints the time and the peak live heap;
 * then tries to decode the whole image with {@link ImageIO#read} for comparison. Run in a small heap to show the
 * build fits where the whole image does not, e.g.
 * {@code java -Xmx64m -Djava.awt.headless=true -cp <classes> org.faultbench.digitize.raster.PyramidMemoryBenchmark
 * 12000 9000}. Not a unit test: it needs its own JVM and about a minute.
 */
public final class PyramidMemoryBenchmark {

    private PyramidMemoryBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        int width = args.length > 0 ? Integer.parseInt(args[0]) : 12_000;
        int height = args.length > 1 ? Integer.parseInt(args[1]) : 9_000;
        Path dir = Files.createTempDirectory("pyramid-benchmark");
        try {
            Path png = dir.resolve("scan.png");
            SyntheticPng.writeGrey(png, width, height, (x, y) -> ((x >> 3) * 3 + (y >> 3) * 5) & 0xFF);
            PyramidSettings settings = PyramidSettings.DEFAULT;
            HeapSampler sampler = new HeapSampler(32);
            long start = System.nanoTime();
            ImagePyramid pyramid = ImagePyramid.build(RasterSource.open(png), settings,
                    TileStore.inDirectory(dir.resolve("tiles")), sampler);
            double seconds = (System.nanoTime() - start) / 1e9;
            System.out.printf("image %d x %d, PNG %.1f MB, max heap %.0f MB%n", width, height,
                    Files.size(png) / 1e6, Runtime.getRuntime().maxMemory() / 1e6);
            System.out.printf("pyramid: %d levels, %d tiles, %.1f s (with %d forced GCs)%n", pyramid.levelCount(),
                    pyramid.layout().totalTiles(), seconds, sampler.samples());
            System.out.printf("peak live heap above baseline %.1f MB; stated bound %.1f MB; whole image as ARGB"
                    + " %.1f MB%n", sampler.peakAboveBaseline() / 1e6,
                    settings.workingMemoryBound(width, 1) / 1e6, 4.0 * width * height / 1e6);
            tryWholeDecode(png);
        } finally {
            try (Stream<Path> walk = Files.walk(dir)) {
                for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(p);
                }
            }
        }
    }

    private static void tryWholeDecode(Path png) throws IOException {
        try {
            var image = ImageIO.read(png.toFile());
            System.out.printf("whole-image ImageIO.read succeeded (%d x %d)%n", image.getWidth(), image.getHeight());
        } catch (OutOfMemoryError e) {
            System.out.println("whole-image ImageIO.read failed: " + e);
        } catch (IOException e) {
            // the PNG reader wraps an OutOfMemoryError in an IIOException
            System.out.println("whole-image ImageIO.read failed: " + e.getCause());
        }
    }
}
