package org.faultbench.digitize.raster;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

import org.faultbench.digitize.georef.WorldFile;

/**
 * A raster image on disk described by its header only (size, format, georeference), so that opening a
 * 12,000 × 9,000 scan costs no pixel memory; pixels are read later, region by region, by {@link ImagePyramid}.
 * <p>
 * Georeference precedence: a world file beside the image wins over GeoTIFF tags inside it, because the sidecar is
 * the easier one to correct and is usually the newer; this is also ESRI's rule (ArcGIS help on world files, from
 * memory).
 *
 * @param file the image file
 * @param format its format, recognised from the content
 * @param width width in pixels
 * @param height height in pixels
 * @param worldFile the georeference, if any
 * @param georeferenceOrigin where {@code worldFile} came from
 */
public record RasterSource(Path file, RasterFormat format, int width, int height, Optional<WorldFile> worldFile,
        GeoreferenceOrigin georeferenceOrigin) {

    public RasterSource {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(worldFile, "worldFile");
        Objects.requireNonNull(georeferenceOrigin, "georeferenceOrigin");
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("raster size must be positive, got width " + width + " and height "
                    + height + " pixels");
        }
        if (worldFile.isPresent() == (georeferenceOrigin == GeoreferenceOrigin.NONE)) {
            throw new IllegalArgumentException("georeferenceOrigin " + georeferenceOrigin
                    + " does not match a world file that is " + (worldFile.isPresent() ? "present" : "absent"));
        }
    }

    /** Reads the image header and any georeference without decoding pixels. */
    public static RasterSource open(Path file) throws IOException {
        return ImageFile.decoding(file, () -> openChecked(file));
    }

    private static RasterSource openChecked(Path file) throws IOException {
        try (ImageFile image = ImageFile.open(file, true)) {
            int width = image.reader().getWidth(0);
            int height = image.reader().getHeight(0);
            RasterFormat format = image.format();
            Optional<Path> sidecar = WorldFileLocator.find(file, format);
            if (sidecar.isPresent()) {
                return new RasterSource(file, format, width, height, Optional.of(WorldFile.read(sidecar.get())),
                        GeoreferenceOrigin.WORLD_FILE);
            }
            Optional<WorldFile> tags = format == RasterFormat.TIFF
                    ? GeoTiffGeoreference.fromMetadata(image.reader().getImageMetadata(0))
                    : Optional.empty();
            return new RasterSource(file, format, width, height, tags,
                    tags.isPresent() ? GeoreferenceOrigin.GEOTIFF_TAGS : GeoreferenceOrigin.NONE);
        }
    }
}
