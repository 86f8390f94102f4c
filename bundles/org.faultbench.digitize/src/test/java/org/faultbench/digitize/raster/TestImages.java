package org.faultbench.digitize.raster;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;

import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.plugins.tiff.GeoTIFFTagSet;
import javax.imageio.plugins.tiff.TIFFDirectory;
import javax.imageio.plugins.tiff.TIFFField;
import javax.imageio.plugins.tiff.TIFFTag;
import javax.imageio.stream.ImageOutputStream;

/** Small images written with ImageIO for the raster tests. */
final class TestImages {

    private TestImages() {
    }

    /** An opaque RGB image whose pixel (x, y) is (x, y, x + y) modulo 256. */
    static BufferedImage rgbPattern(int width, int height) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                image.setRGB(x, y, (x & 0xFF) << 16 | (y & 0xFF) << 8 | (x + y) & 0xFF);
            }
        }
        return image;
    }

    static Path write(BufferedImage image, String format, Path file) throws IOException {
        if (!ImageIO.write(image, format, file.toFile())) {
            throw new IOException("no ImageIO writer for " + format);
        }
        return file;
    }

    /** A TIFF carrying the given GeoTIFF fields (tag number → doubles, or the GeoKeyDirectory as chars). */
    static Path writeGeoTiff(Path file, BufferedImage image, TIFFField... geoFields) throws IOException {
        ImageWriter writer = ImageIO.getImageWritersByFormatName("tiff").next();
        // a null write param makes the JDK 17 TIFF writer fail with a NullPointerException
        IIOMetadata metadata = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image),
                writer.getDefaultWriteParam());
        TIFFDirectory directory = TIFFDirectory.createFromMetadata(metadata);
        for (TIFFField field : geoFields) {
            directory.addTIFFField(field);
        }
        try (ImageOutputStream out = ImageIO.createImageOutputStream(file.toFile())) {
            writer.setOutput(out);
            writer.write(null, new IIOImage(image, null, directory.getAsMetadata()), null);
        } finally {
            writer.dispose();
        }
        return file;
    }

    static TIFFField doubles(int tagNumber, double... values) {
        TIFFTag tag = GeoTIFFTagSet.getInstance().getTag(tagNumber);
        return new TIFFField(tag, TIFFTag.TIFF_DOUBLE, values.length, values);
    }

    static TIFFField shorts(int tagNumber, char... values) {
        TIFFTag tag = GeoTIFFTagSet.getInstance().getTag(tagNumber);
        return new TIFFField(tag, TIFFTag.TIFF_SHORT, values.length, values);
    }
}
