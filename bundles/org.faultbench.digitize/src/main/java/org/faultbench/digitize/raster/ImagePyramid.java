package org.faultbench.digitize.raster;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.util.Objects;

/**
 * A tiled image pyramid of a scanned map, so a viewer can show a 12,000 × 9,000 scan at any zoom without holding it
 * at full resolution: level k is the scan reduced 2^k times by 2×2 box averaging, cut into square tiles kept as PNG
 * in a {@link TileStore}.
 * <p>
 * Memory: building holds one source strip plus a few tile buffers (bound stated in {@link PyramidSettings}); with
 * a directory store, a built pyramid holds nothing but its layout, and each {@link #tile} or {@link #region} call
 * decodes only the tiles it needs. Callers that redraw often keep their own cache of decoded tiles.
 * <p>
 * Pixels are non-premultiplied sRGB ARGB; grey scans keep their grey values exactly at level 0.
 */
public final class ImagePyramid {
    private final PyramidLayout layout;
    private final TileStore store;

    private ImagePyramid(PyramidLayout layout, TileStore store) {
        this.layout = layout;
        this.store = store;
    }

    /**
     * Builds the pyramid of {@code source} into {@code store}. A cancelled or failed build leaves a partial store
     * that should be discarded.
     *
     * @throws java.util.concurrent.CancellationException when {@code progress} asks to cancel
     * @throws IOException when the image cannot be read or has changed size since it was opened
     */
    public static ImagePyramid build(RasterSource source, PyramidSettings settings, TileStore store,
            BuildProgress progress) throws IOException {
        Objects.requireNonNull(store, "store");
        Objects.requireNonNull(progress, "progress");
        PyramidLayout layout = new PyramidLayout(source.width(), source.height(), settings.tileSize());
        return ImageFile.decoding(source.file(), () -> build(source, settings, store, progress, layout));
    }

    private static ImagePyramid build(RasterSource source, PyramidSettings settings, TileStore store,
            BuildProgress progress, PyramidLayout layout) throws IOException {
        try (ImageFile image = ImageFile.open(source.file(), false)) {
            int width = image.reader().getWidth(0);
            int height = image.reader().getHeight(0);
            if (width != source.width() || height != source.height()) {
                throw new IOException(source.file() + ": image is now " + width + " × " + height
                        + " pixels, was " + source.width() + " × " + source.height() + " when opened");
            }
            new PyramidBuilder(layout, store, progress).build(image.reader(), settings.stripHeight());
        }
        return new ImagePyramid(layout, store);
    }

    public PyramidLayout layout() {
        return layout;
    }

    public int levelCount() {
        return layout.levelCount();
    }

    public int levelWidth(int level) {
        return layout.levelWidth(level);
    }

    public int levelHeight(int level) {
        return layout.levelHeight(level);
    }

    /** One tile as a TYPE_INT_ARGB image; tiles of the last row and column may be smaller than the tile size. */
    public BufferedImage tile(int level, int column, int row) throws IOException {
        return tilePixels(level, column, row).toImage();
    }

    /**
     * The pixels of {@code level} in the rectangle (x, y, width, height) of that level's pixel grid, as a
     * TYPE_INT_ARGB image; parts outside the level are transparent, so a viewer may ask for its whole viewport.
     */
    public BufferedImage region(int level, int x, int y, int width, int height) throws IOException {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("region size must be positive, got width " + width + " and height "
                    + height + " pixels");
        }
        BufferedImage region = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        int tileSize = layout.tileSize();
        int firstColumn = Math.max(0, Math.floorDiv(x, tileSize));
        int lastColumn = Math.min(layout.tilesAcross(level) - 1, Math.floorDiv(x + width - 1, tileSize));
        int firstRow = Math.max(0, Math.floorDiv(y, tileSize));
        int lastRow = Math.min(layout.tilesDown(level) - 1, Math.floorDiv(y + height - 1, tileSize));
        for (int row = firstRow; row <= lastRow; row++) {
            for (int column = firstColumn; column <= lastColumn; column++) {
                copyTile(tilePixels(level, column, row), column * tileSize - x, row * tileSize - y, region);
            }
        }
        return region;
    }

    private TilePixels tilePixels(int level, int column, int row) throws IOException {
        return TileCodec.decode(store.get(layout.tileKey(level, column, row)));
    }

    private static void copyTile(TilePixels tile, int left, int top, BufferedImage region) {
        int fromX = Math.max(0, -left);
        int fromY = Math.max(0, -top);
        int toX = Math.min(tile.width(), region.getWidth() - left);
        int toY = Math.min(tile.height(), region.getHeight() - top);
        if (fromX < toX && fromY < toY) {
            region.setRGB(left + fromX, top + fromY, toX - fromX, toY - fromY, tile.argb(),
                    fromY * tile.width() + fromX, tile.width());
        }
    }
}
