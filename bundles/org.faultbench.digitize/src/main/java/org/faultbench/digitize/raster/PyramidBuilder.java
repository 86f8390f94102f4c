package org.faultbench.digitize.raster;

import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.util.concurrent.CancellationException;

import javax.imageio.ImageReadParam;
import javax.imageio.ImageReader;

/**
 * Builds the tiles of every level into a store: level 0 from full-width source strips decoded one at a time with
 * {@link ImageReadParam#setSourceRegion}, each higher level from the stored tiles of the level below by a 2×2 box
 * reduction, so the full image is never decoded at once (memory bound in {@link PyramidSettings}).
 */
final class PyramidBuilder {
    private final PyramidLayout layout;
    private final TileStore store;
    private final BuildProgress progress;
    private final int total;
    private int done;

    PyramidBuilder(PyramidLayout layout, TileStore store, BuildProgress progress) {
        this.layout = layout;
        this.store = store;
        this.progress = progress;
        this.total = layout.totalTiles();
    }

    void build(ImageReader reader, int stripHeight) throws IOException {
        for (int top = 0; top < layout.height(); top += stripHeight) {
            int rows = Math.min(stripHeight, layout.height() - top);
            cutStrip(readStrip(reader, top, rows), top);
        }
        for (int level = 1; level < layout.levelCount(); level++) {
            for (int row = 0; row < layout.tilesDown(level); row++) {
                for (int column = 0; column < layout.tilesAcross(level); column++) {
                    store(new TileKey(level, column, row), reduceChildren(level, column, row));
                }
            }
        }
    }

    private BufferedImage readStrip(ImageReader reader, int top, int rows) throws IOException {
        checkCancelled();
        ImageReadParam param = reader.getDefaultReadParam();
        param.setSourceRegion(new Rectangle(0, top, layout.width(), rows));
        return reader.read(0, param);
    }

    private void cutStrip(BufferedImage strip, int top) throws IOException {
        int tileSize = layout.tileSize();
        for (int y = 0; y < strip.getHeight(); y += tileSize) {
            int row = (top + y) / tileSize;
            for (int column = 0; column < layout.tilesAcross(0); column++) {
                TilePixels tile = ArgbPixels.read(strip, column * tileSize, y, layout.tileWidth(0, column),
                        layout.tileHeight(0, row));
                store(new TileKey(0, column, row), tile);
            }
        }
    }

    /** The up to four tiles of level − 1 under tile (column, row) of level, mosaicked and halved. */
    private TilePixels reduceChildren(int level, int column, int row) throws IOException {
        int below = level - 1;
        int tileSize = layout.tileSize();
        int firstColumn = 2 * column;
        int firstRow = 2 * row;
        int lastColumn = Math.min(firstColumn + 1, layout.tilesAcross(below) - 1);
        int lastRow = Math.min(firstRow + 1, layout.tilesDown(below) - 1);
        int width = (lastColumn - firstColumn) * tileSize + layout.tileWidth(below, lastColumn);
        int height = (lastRow - firstRow) * tileSize + layout.tileHeight(below, lastRow);
        int[] mosaic = new int[width * height];
        for (int childRow = firstRow; childRow <= lastRow; childRow++) {
            for (int childColumn = firstColumn; childColumn <= lastColumn; childColumn++) {
                TilePixels child = TileCodec.decode(store.get(new TileKey(below, childColumn, childRow)));
                int left = (childColumn - firstColumn) * tileSize;
                int top = (childRow - firstRow) * tileSize;
                for (int y = 0; y < child.height(); y++) {
                    System.arraycopy(child.argb(), y * child.width(), mosaic, (top + y) * width + left,
                            child.width());
                }
            }
        }
        return new TilePixels(width, height, mosaic).halved();
    }

    private void store(TileKey key, TilePixels tile) throws IOException {
        checkCancelled();
        store.put(key, TileCodec.encode(tile));
        done++;
        progress.tilesDone(done, total);
    }

    private void checkCancelled() {
        if (progress.isCancelled()) {
            throw new CancellationException("image pyramid build cancelled after " + done + " of " + total
                    + " tiles");
        }
    }
}
