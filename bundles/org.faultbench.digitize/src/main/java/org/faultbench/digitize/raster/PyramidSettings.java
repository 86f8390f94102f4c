package org.faultbench.digitize.raster;

/**
 * How a pyramid is cut and how much of the source is decoded at once.
 * <p>
 * Memory bound of a build (heap held at any moment, tiles going to a {@link TileStore#inDirectory directory}):
 * one source strip of {@code width × stripHeight() × b} bytes, b being the bytes per pixel of the decoded source
 * (1 for 8-bit grey, 3 for 8-bit RGB, 4 for RGBA, up to 8 for 16-bit RGBA), plus about
 * {@value #TILE_BUFFERS} tile-sized ARGB buffers ({@code tileSize² × 4} bytes each) for cutting, reducing and PNG
 * coding, plus a few source rows of reader buffers. It does not grow with the image height, and only through the
 * strip with its width; see {@link #workingMemoryBound(int, int)}.
 *
 * @param tileSize tile edge in pixels
 * @param stripTiles height of a decoded source strip, in tiles; taller strips mean fewer passes over a PNG or JPEG
 *        (whose readers decode from the top of the file for every region) at the cost of more memory
 */
public record PyramidSettings(int tileSize, int stripTiles) {

    /** 256-pixel tiles read in strips two tiles high: 6 MB of strip for a 12,000-pixel-wide grey scan. */
    public static final PyramidSettings DEFAULT = new PyramidSettings(256, 2);

    /** Tile-sized ARGB buffers alive at once: 4 child tiles, a 2×2 mosaic of them, the result and PNG coding. */
    static final int TILE_BUFFERS = 16;
    /** Source rows a reader buffers internally (current and previous row for PNG filters, with margin). */
    static final int READER_ROWS = 4;
    private static final int ARGB_BYTES = 4;
    private static final int MAX_SOURCE_BYTES_PER_PIXEL = 8;

    public PyramidSettings {
        if (tileSize < 16 || tileSize > 4096) {
            throw new IllegalArgumentException("tileSize must be 16 to 4096 pixels, got " + tileSize);
        }
        if (stripTiles < 1) {
            throw new IllegalArgumentException("stripTiles must be at least 1, got " + stripTiles);
        }
    }

    /** Rows of the source decoded at once. */
    public int stripHeight() {
        return tileSize * stripTiles;
    }

    /**
     * The stated working-memory bound in bytes for a source {@code width} pixels wide decoding to
     * {@code sourceBytesPerPixel} bytes per pixel.
     */
    public long workingMemoryBound(int width, int sourceBytesPerPixel) {
        if (sourceBytesPerPixel < 1 || sourceBytesPerPixel > MAX_SOURCE_BYTES_PER_PIXEL) {
            throw new IllegalArgumentException("sourceBytesPerPixel must be 1 to " + MAX_SOURCE_BYTES_PER_PIXEL
                    + ", got " + sourceBytesPerPixel);
        }
        long strip = (long) width * stripHeight() * sourceBytesPerPixel;
        long tiles = (long) TILE_BUFFERS * tileSize * tileSize * ARGB_BYTES;
        long readerRows = (long) READER_ROWS * width * MAX_SOURCE_BYTES_PER_PIXEL;
        return strip + tiles + readerRows;
    }
}
