package org.faultbench.digitize.raster;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Tiles as files {@code <directory>/<level>/<column>_<row>.png}, so the heap holds none of them. */
final class DirectoryTileStore implements TileStore {
    private final Path directory;

    DirectoryTileStore(Path directory) throws IOException {
        this.directory = Files.createDirectories(directory);
    }

    @Override
    public void put(TileKey key, byte[] png) throws IOException {
        Path file = fileOf(key);
        Files.createDirectories(file.getParent());
        Files.write(file, png);
    }

    @Override
    public byte[] get(TileKey key) throws IOException {
        return Files.readAllBytes(fileOf(key));
    }

    private Path fileOf(TileKey key) {
        return directory.resolve(Integer.toString(key.level())).resolve(key.column() + "_" + key.row() + ".png");
    }
}
