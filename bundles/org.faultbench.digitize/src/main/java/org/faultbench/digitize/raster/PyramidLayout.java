package org.faultbench.digitize.raster;

/**
 * Size of every level and tile grid of an image pyramid: level k is the image downsampled by 2^k (sizes rounded
 * up), cut into square tiles from the upper-left corner, the last row and column of tiles being smaller when the
 * level size is not a multiple of the tile size. Levels stop at the first one that fits in a single tile.
 *
 * @param width level-0 width in pixels
 * @param height level-0 height in pixels
 * @param tileSize tile edge in pixels
 */
public record PyramidLayout(int width, int height, int tileSize) {

    public PyramidLayout {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("image size must be positive, got width " + width + " and height "
                    + height + " pixels");
        }
        if (tileSize <= 0) {
            throw new IllegalArgumentException("tileSize must be positive, got " + tileSize);
        }
    }

    public int levelCount() {
        int count = 1;
        while (halvings(Math.max(width, height), count - 1) > tileSize) {
            count++;
        }
        return count;
    }

    public int levelWidth(int level) {
        return halvings(width, checkLevel(level));
    }

    public int levelHeight(int level) {
        return halvings(height, checkLevel(level));
    }

    public int tilesAcross(int level) {
        return (int) ceilDiv(levelWidth(level), tileSize);
    }

    public int tilesDown(int level) {
        return (int) ceilDiv(levelHeight(level), tileSize);
    }

    /** Width of tile column {@code column} at {@code level}: the tile size except possibly for the last column. */
    public int tileWidth(int level, int column) {
        checkIndex("column", column, tilesAcross(level), level);
        return Math.min(tileSize, levelWidth(level) - column * tileSize);
    }

    /** Height of tile row {@code row} at {@code level}: the tile size except possibly for the last row. */
    public int tileHeight(int level, int row) {
        checkIndex("row", row, tilesDown(level), level);
        return Math.min(tileSize, levelHeight(level) - row * tileSize);
    }

    /** The key of tile (column, row) at {@code level}, checked to lie in this pyramid. */
    public TileKey tileKey(int level, int column, int row) {
        checkIndex("column", column, tilesAcross(level), level);
        checkIndex("row", row, tilesDown(level), level);
        return new TileKey(level, column, row);
    }

    /** Number of tiles over all levels. */
    public int totalTiles() {
        int total = 0;
        for (int level = 0; level < levelCount(); level++) {
            total += tilesAcross(level) * tilesDown(level);
        }
        return total;
    }

    private static int halvings(int size, int level) {
        return (int) ceilDiv(size, 1L << level);
    }

    private static long ceilDiv(long numerator, long denominator) {
        return (numerator + denominator - 1) / denominator;
    }

    private int checkLevel(int level) {
        if (level < 0 || level >= levelCount()) {
            throw new IllegalArgumentException("pyramid level must be 0 to " + (levelCount() - 1) + ", got " + level);
        }
        return level;
    }

    private void checkIndex(String name, int index, int count, int level) {
        if (index < 0 || index >= count) {
            throw new IllegalArgumentException("tile " + name + " at level " + level + " must be 0 to " + (count - 1)
                    + ", got " + index);
        }
    }
}
