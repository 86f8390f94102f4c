package org.faultbench.digitize.ui.map;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.swt.graphics.Device;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.raster.TileKey;

/**
 * The decoded pyramid tiles as SWT images, most recently drawn first; the least recently drawn are disposed when more
 * than {@link #CAPACITY} are held (about 25 MB of 256-pixel tiles), and all of them when the editor closes.
 */
final class TileImageCache {
    static final int CAPACITY = 96;

    private final ImagePyramid pyramid;
    private final Map<TileKey, Image> images = new LinkedHashMap<>(CAPACITY, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<TileKey, Image> eldest) {
            if (size() > CAPACITY) {
                eldest.getValue().dispose();
                return true;
            }
            return false;
        }
    };

    TileImageCache(ImagePyramid pyramid) {
        this.pyramid = pyramid;
    }

    ImagePyramid pyramid() {
        return pyramid;
    }

    Image image(Device device, TileKey key) throws IOException {
        Image image = images.get(key);
        if (image == null) {
            image = new Image(device, imageData(pyramid.tile(key.level(), key.column(), key.row())));
            images.put(key, image);
        }
        return image;
    }

    int size() {
        return images.size();
    }

    void dispose() {
        images.values().forEach(Image::dispose);
        images.clear();
    }

    static ImageData imageData(BufferedImage argbImage) {
        int width = argbImage.getWidth();
        int height = argbImage.getHeight();
        int[] argb = argbImage.getRGB(0, 0, width, height, null, 0, width);
        ImageData data = new ImageData(width, height, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        byte[] alpha = new byte[width * height];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int pixel = argb[y * width + x];
                data.setPixel(x, y, pixel & 0xFFFFFF);
                alpha[y * width + x] = (byte) (pixel >>> 24);
            }
        }
        data.alphaData = alpha;
        return data;
    }
}
