package org.faultbench.digitize.ui.map;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.faultbench.digitize.raster.BuildProgress;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.raster.PyramidSettings;
import org.faultbench.digitize.raster.RasterSource;
import org.faultbench.digitize.raster.TileStore;

/**
 * Builds the pyramid of a scan for the editor: small scans in memory, large ones (over {@link #MEMORY_PIXELS}) in a
 * temporary directory so the heap holds no tiles. {@link MapOpenJob} builds it in the background and leaves it here,
 * so the editor, opened afterwards on the UI thread, only picks it up.
 */
final class ScanPyramids {
    static final long MEMORY_PIXELS = 25_000_000L;
    private static final Map<Path, ImagePyramid> BUILT = new ConcurrentHashMap<>();

    private ScanPyramids() {
    }

    /** Builds the pyramid of {@code scan} and keeps it for the editor. */
    static ImagePyramid build(Path scan, BuildProgress progress) throws IOException {
        RasterSource source = RasterSource.open(scan);
        TileStore store = (long) source.width() * source.height() <= MEMORY_PIXELS ? TileStore.inMemory()
                : TileStore.inDirectory(Files.createTempDirectory("faultbench-tiles-"));
        ImagePyramid pyramid = ImagePyramid.build(source, PyramidSettings.DEFAULT, store, progress);
        BUILT.put(key(scan), pyramid);
        return pyramid;
    }

    /** The pyramid built in the background, or (an editor opened directly, e.g. on restart) one built now. */
    static ImagePyramid builtOrBuild(Path scan) throws IOException {
        ImagePyramid built = BUILT.get(key(scan));
        return built != null ? built : build(scan, BuildProgress.NONE);
    }

    /** Forgets the pyramid of a scan whose editor closed. */
    static void release(Path scan) {
        BUILT.remove(key(scan));
    }

    private static Path key(Path scan) {
        return scan.toAbsolutePath().normalize();
    }
}
