package org.faultbench.digitize.raster;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Where pyramid tiles live once built, as PNG bytes. A directory on disk keeps the heap free of tiles whatever the
 * scan size and is the choice for large scans; memory is for small images and tests.
 */
public interface TileStore {

    void put(TileKey key, byte[] png) throws IOException;

    /** @throws IOException when the tile was never stored or cannot be read */
    byte[] get(TileKey key) throws IOException;

    /** A store on the heap: compressed tiles count against the heap. */
    static TileStore inMemory() {
        return new MemoryTileStore();
    }

    /**
     * A store in {@code directory} (created if missing), one PNG file per tile; the caller owns the directory and
     * deletes it when the pyramid is no longer needed.
     */
    static TileStore inDirectory(Path directory) throws IOException {
        return new DirectoryTileStore(directory);
    }
}
