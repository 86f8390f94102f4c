package org.faultbench.digitize.ui.map;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.faultbench.digitize.raster.BuildProgress;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.raster.PyramidSettings;
import org.faultbench.digitize.raster.RasterSource;
import org.faultbench.digitize.raster.TileStore;

/**
 * Builds the pyramid of a scan for the editor: small scans in memory, large ones (over {@link #MEMORY_PIXELS}) in a
 * temporary directory so the heap holds no tiles.
 */
final class ScanPyramids {
    static final long MEMORY_PIXELS = 25_000_000L;

    private ScanPyramids() {
    }

    static ImagePyramid build(Path scan) throws IOException {
        RasterSource source = RasterSource.open(scan);
        TileStore store = (long) source.width() * source.height() <= MEMORY_PIXELS ? TileStore.inMemory()
                : TileStore.inDirectory(Files.createTempDirectory("faultbench-tiles-"));
        return ImagePyramid.build(source, PyramidSettings.DEFAULT, store, BuildProgress.NONE);
    }
}
