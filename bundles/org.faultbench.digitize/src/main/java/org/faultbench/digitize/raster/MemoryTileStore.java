package org.faultbench.digitize.raster;

import java.io.IOException;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/** Tiles held as PNG bytes on the heap; safe for a viewer thread reading while nothing writes. */
final class MemoryTileStore implements TileStore {
    private final Map<TileKey, byte[]> tiles = new ConcurrentHashMap<>();

    @Override
    public void put(TileKey key, byte[] png) {
        tiles.put(key, png.clone());
    }

    @Override
    public byte[] get(TileKey key) throws IOException {
        byte[] png = tiles.get(key);
        if (png == null) {
            throw new IOException("no tile stored for " + key);
        }
        return png.clone();
    }
}
