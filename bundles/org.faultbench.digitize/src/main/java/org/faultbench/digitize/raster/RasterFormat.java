package org.faultbench.digitize.raster;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * The raster formats a scanned map may be imported from, with the extensions of the world file that may sit beside
 * an image of that format (ESRI, "World files for raster datasets", ArcGIS help, from memory: first and last letter
 * of the image extension plus "w", or the whole extension plus "w"; ".wld" for any format).
 */
public enum RasterFormat {
    PNG(List.of("pgw", "pngw"), "png"),
    JPEG(List.of("jgw", "jpgw", "jpegw"), "jpeg", "jpg"),
    TIFF(List.of("tfw", "tifw", "tiffw"), "tif", "tiff"),
    BMP(List.of("bpw", "bmpw"), "bmp");

    /** World-file extension accepted for every format, tried after the format-specific ones. */
    public static final String GENERIC_WORLD_FILE_EXTENSION = "wld";

    private final List<String> worldFileExtensions;
    private final List<String> imageIoNames;

    RasterFormat(List<String> worldFileExtensions, String... imageIoNames) {
        this.worldFileExtensions = worldFileExtensions;
        this.imageIoNames = List.of(imageIoNames);
    }

    /** World-file extensions in the order they are looked for, lower case, without the dot; ".wld" last. */
    public List<String> worldFileExtensions() {
        return Stream.concat(worldFileExtensions.stream(), Stream.of(GENERIC_WORLD_FILE_EXTENSION)).toList();
    }

    /** The format an ImageIO reader reports ("png", "JPEG", "tif", ...), or empty for a format not supported here. */
    public static Optional<RasterFormat> ofImageIoName(String formatName) {
        String name = formatName.toLowerCase(Locale.ROOT);
        for (RasterFormat format : values()) {
            if (format.imageIoNames.contains(name)) {
                return Optional.of(format);
            }
        }
        return Optional.empty();
    }
}
