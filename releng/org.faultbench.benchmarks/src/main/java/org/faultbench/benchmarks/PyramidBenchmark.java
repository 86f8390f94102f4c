package org.faultbench.benchmarks;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.faultbench.digitize.raster.BuildProgress;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.raster.PyramidSettings;
import org.faultbench.digitize.raster.RasterSource;
import org.faultbench.digitize.raster.TileStore;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The scan target of the map workflow: the image pyramid of a 12,000 × 9,000 grey scan ({@link ScanPng}, written once
 * per trial) built into a {@link TileStore#inDirectory directory} store with the default settings. The forked JVM
 * gets a {@value #HEAP} heap, a quarter of what the whole image needs decoded as ARGB (432 MB), so a run that
 * completes shows the build streams; after each build the highest used heap (the sum of the heap pools' peaks,
 * garbage included) is printed.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgsAppend = { "-Xmx" + PyramidBenchmark.HEAP, "-Djava.awt.headless=true" })
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class PyramidBenchmark {
    static final String HEAP = "32m";
    private static final int WIDTH = 12_000;
    private static final int HEIGHT = 9_000;

    private Path directory;
    private RasterSource scan;
    private Path tiles;

    @Setup(Level.Trial)
    public void writeScan() throws IOException {
        directory = Files.createTempDirectory("pyramid-benchmark");
        Path png = directory.resolve("scan.png");
        ScanPng.write(png, WIDTH, HEIGHT);
        scan = RasterSource.open(png);
    }

    @Setup(Level.Invocation)
    public void freshStore() {
        tiles = directory.resolve("tiles");
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            pool.resetPeakUsage();
        }
    }

    @Benchmark
    public ImagePyramid build() throws IOException {
        return ImagePyramid.build(scan, PyramidSettings.DEFAULT, TileStore.inDirectory(tiles), BuildProgress.NONE);
    }

    /** Prints the peak used heap of the build just timed, next to JMH's own iteration line. */
    @TearDown(Level.Invocation)
    public void reportPeakAndDeleteTiles() throws IOException {
        long bytes = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                bytes += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf("  heap pools' peaks add up to %.1f MB (max heap %s)%n", bytes / 1e6, HEAP);
        delete(tiles);
    }

    @TearDown(Level.Trial)
    public void deleteScan() throws IOException {
        delete(directory);
    }

    private static void delete(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
