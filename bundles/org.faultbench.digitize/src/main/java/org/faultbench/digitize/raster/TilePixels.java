package org.faultbench.digitize.raster;

import java.awt.image.BufferedImage;

/**
 * A block of pixels as packed non-premultiplied sRGB ARGB ints, row by row: the single pixel form the pyramid works
 * in, whatever the source format.
 */
record TilePixels(int width, int height, int[] argb) {

    TilePixels {
        if (width <= 0 || height <= 0 || argb.length != width * height) {
            throw new IllegalArgumentException("tile pixels must be a positive width × height array, got " + width
                    + " × " + height + " with " + argb.length + " values");
        }
    }

    int at(int x, int y) {
        return argb[y * width + x];
    }

    /**
     * The 2× reduction: each output pixel is the mean, channel by channel and rounded half up, of the 2×2 block it
     * covers, or of the 1 or 2 pixels left of that block at an odd right or bottom edge. A box filter keeps a
     * one-pixel contour line visible as a paler line, where dropping every other pixel would lose it.
     */
    TilePixels halved() {
        int outWidth = (width + 1) / 2;
        int outHeight = (height + 1) / 2;
        int[] out = new int[outWidth * outHeight];
        for (int y = 0; y < outHeight; y++) {
            for (int x = 0; x < outWidth; x++) {
                out[y * outWidth + x] = blockMean(2 * x, 2 * y);
            }
        }
        return new TilePixels(outWidth, outHeight, out);
    }

    /** The pixels as a TYPE_INT_ARGB image (a copy). */
    BufferedImage toImage() {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        image.setRGB(0, 0, width, height, argb, 0, width);
        return image;
    }

    private int blockMean(int left, int top) {
        int right = Math.min(left + 2, width);
        int bottom = Math.min(top + 2, height);
        int count = (right - left) * (bottom - top);
        int mean = 0;
        for (int shift = 0; shift < Integer.SIZE; shift += Byte.SIZE) {
            int sum = 0;
            for (int y = top; y < bottom; y++) {
                for (int x = left; x < right; x++) {
                    sum += (at(x, y) >>> shift) & 0xFF;
                }
            }
            mean |= ((sum + count / 2) / count) << shift;
        }
        return mean;
    }
}
