package org.faultbench.digitize.raster;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;

import javax.imageio.ImageIO;

/**
 * Lossless PNG coding of tiles, written as 8-bit grey when every pixel is an opaque grey, as RGB when opaque, and
 * as RGBA otherwise, so that a grey scan costs a quarter of the bytes and coding time of a full ARGB tile.
 */
final class TileCodec {
    private static final int ALPHA_OPAQUE = 0xFF000000;

    private TileCodec() {
    }

    static byte[] encode(TilePixels tile) throws IOException {
        ByteArrayOutputStream png = new ByteArrayOutputStream();
        if (!ImageIO.write(compactImage(tile), "png", png)) {
            throw new IOException("no PNG writer available in this Java runtime");
        }
        return png.toByteArray();
    }

    static TilePixels decode(byte[] png) throws IOException {
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
        if (image == null) {
            throw new IOException("stored tile is not a readable PNG");
        }
        return ArgbPixels.read(image, 0, 0, image.getWidth(), image.getHeight());
    }

    private static BufferedImage compactImage(TilePixels tile) {
        boolean opaque = true;
        boolean grey = true;
        for (int pixel : tile.argb()) {
            opaque &= (pixel & ALPHA_OPAQUE) == ALPHA_OPAQUE;
            grey &= isGrey(pixel);
        }
        if (!opaque) {
            return tile.toImage();
        }
        if (!grey) {
            BufferedImage rgb = new BufferedImage(tile.width(), tile.height(), BufferedImage.TYPE_INT_RGB);
            rgb.setRGB(0, 0, tile.width(), tile.height(), tile.argb(), 0, tile.width());
            return rgb;
        }
        BufferedImage image = new BufferedImage(tile.width(), tile.height(), BufferedImage.TYPE_BYTE_GRAY);
        int[] levels = new int[tile.argb().length];
        for (int i = 0; i < levels.length; i++) {
            levels[i] = tile.argb()[i] & 0xFF;
        }
        image.getRaster().setSamples(0, 0, tile.width(), tile.height(), 0, levels);
        return image;
    }

    private static boolean isGrey(int pixel) {
        int red = (pixel >>> 16) & 0xFF;
        int green = (pixel >>> 8) & 0xFF;
        return red == green && green == (pixel & 0xFF);
    }
}
