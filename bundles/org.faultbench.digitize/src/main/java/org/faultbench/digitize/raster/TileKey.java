package org.faultbench.digitize.raster;

/**
 * Address of one pyramid tile.
 *
 * @param level pyramid level, 0 = full resolution
 * @param column tile column, 0 = left
 * @param row tile row, 0 = top
 */
public record TileKey(int level, int column, int row) {

    public TileKey {
        if (level < 0 || column < 0 || row < 0) {
            throw new IllegalArgumentException("tile level, column and row must not be negative, got level " + level
                    + ", column " + column + ", row " + row);
        }
    }
}
