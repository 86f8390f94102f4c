package org.faultbench.digitize.raster;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Iterator;

import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;

import org.faultbench.digitize.io.FormatException;

/**
 * An image file opened for random-access reading with the ImageIO reader that recognises its content (not its
 * extension); only the first image of a multi-image file is used by the workbench.
 */
final class ImageFile implements AutoCloseable {
    private final ImageInputStream stream;
    private final ImageReader reader;
    private final RasterFormat format;

    private ImageFile(ImageInputStream stream, ImageReader reader, RasterFormat format) {
        this.stream = stream;
        this.reader = reader;
        this.format = format;
    }

    /**
     * @param withMetadata read image metadata too (needed for GeoTIFF tags); otherwise the reader skips it
     * @throws FormatException when the file is not a PNG, JPEG, TIFF or BMP image
     */
    static ImageFile open(Path file, boolean withMetadata) throws IOException {
        ImageInputStream stream = ImageIO.createImageInputStream(file.toFile());
        if (stream == null) {
            throw new IOException(file + ": cannot be opened for reading");
        }
        Iterator<ImageReader> readers = ImageIO.getImageReaders(stream);
        while (readers.hasNext()) {
            ImageReader reader = readers.next();
            var format = RasterFormat.ofImageIoName(reader.getFormatName());
            if (format.isPresent()) {
                reader.setInput(stream, true, !withMetadata);
                return new ImageFile(stream, reader, format.get());
            }
        }
        stream.close();
        throw new FormatException(file.getFileName().toString(), 0, 0,
                "not a PNG, JPEG, TIFF or BMP image (or the file is damaged)");
    }

    /** Something that reads from an image file through ImageIO. */
    @FunctionalInterface
    interface Decoding<T> {
        T run() throws IOException;
    }

    /**
     * Runs {@code decoding}, turning the runtime exceptions that ImageIO's decoders throw on damaged files
     * (NullPointerException, IllegalArgumentException, ArrayIndexOutOfBoundsException ...) into a
     * {@link FormatException} naming the file. Cancellation passes through.
     */
    static <T> T decoding(Path file, Decoding<T> decoding) throws IOException {
        try {
            return decoding.run();
        } catch (java.util.concurrent.CancellationException cancelled) {
            throw cancelled;
        } catch (RuntimeException damaged) {
            FormatException e = new FormatException(String.valueOf(file.getFileName()), 0, 0,
                    "the image is damaged and cannot be decoded (" + damaged + ")");
            e.initCause(damaged);
            throw e;
        }
    }

    ImageReader reader() {
        return reader;
    }

    RasterFormat format() {
        return format;
    }

    @Override
    public void close() throws IOException {
        reader.dispose();
        stream.close();
    }
}
