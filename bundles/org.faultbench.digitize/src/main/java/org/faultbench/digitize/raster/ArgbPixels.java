package org.faultbench.digitize.raster;

import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ColorModel;
import java.awt.image.ComponentColorModel;
import java.awt.image.Raster;

/**
 * Converts a region of a decoded image to sRGB ARGB.
 * <p>
 * Grey images are copied sample for sample (grey g → (g, g, g)) instead of going through
 * {@link BufferedImage#getRGB}: Java2D treats its grey colour space as linear and would brighten mid-greys (128
 * becomes 188) when converting to sRGB, whereas the grey samples of a PNG, TIFF or JPEG scan are already display
 * values (common practice; PNG Specification 2nd ed., W3C 2003, on the gAMA and sRGB chunks, from memory).
 */
final class ArgbPixels {
    private static final int OPAQUE = 0xFF;

    private ArgbPixels() {
    }

    static TilePixels read(BufferedImage image, int x, int y, int width, int height) {
        ColorModel model = image.getColorModel();
        boolean grey = model instanceof ComponentColorModel
                && model.getColorSpace().getType() == ColorSpace.TYPE_GRAY;
        int[] argb = grey ? greyToArgb(image.getRaster(), model, x, y, width, height)
                : image.getRGB(x, y, width, height, null, 0, width);
        return new TilePixels(width, height, argb);
    }

    private static int[] greyToArgb(Raster raster, ColorModel model, int x, int y, int width, int height) {
        int[] grey = scaledTo8Bits(raster.getSamples(x, y, width, height, 0, (int[]) null), model.getComponentSize(0));
        int[] alpha = null;
        if (model.hasAlpha()) {
            int band = raster.getNumBands() - 1;
            alpha = scaledTo8Bits(raster.getSamples(x, y, width, height, band, (int[]) null),
                    model.getComponentSize(band));
        }
        int[] argb = new int[grey.length];
        for (int i = 0; i < grey.length; i++) {
            int a = alpha == null ? OPAQUE : alpha[i];
            argb[i] = a << 24 | grey[i] << 16 | grey[i] << 8 | grey[i];
        }
        return argb;
    }

    private static int[] scaledTo8Bits(int[] samples, int bits) {
        if (bits != Byte.SIZE) {
            long max = (1L << bits) - 1;
            for (int i = 0; i < samples.length; i++) {
                samples[i] = (int) ((samples[i] * 255L + max / 2) / max);
            }
        }
        return samples;
    }
}
