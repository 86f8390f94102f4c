package org.faultbench.digitize.raster;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Finds the world file beside an image: same base name, an extension the image's format accepts, compared without
 * regard to case because scans often travel between file systems that ignore case ("MAP.TIF" with "map.tfw").
 */
public final class WorldFileLocator {

    private WorldFileLocator() {
    }

    /**
     * The first existing world file for {@code image}, trying {@link RasterFormat#worldFileExtensions()} in order.
     */
    public static Optional<Path> find(Path image, RasterFormat format) throws IOException {
        Path directory = image.toAbsolutePath().getParent();
        List<Path> siblings;
        try (Stream<Path> listing = Files.list(directory)) {
            siblings = listing.filter(Files::isRegularFile).sorted().toList();
        }
        String base = baseName(image.getFileName().toString());
        for (String extension : format.worldFileExtensions()) {
            String wanted = base + "." + extension;
            Optional<Path> match = siblings.stream()
                    .filter(p -> p.getFileName().toString().equalsIgnoreCase(wanted)).findFirst();
            if (match.isPresent()) {
                return match;
            }
        }
        return Optional.empty();
    }

    private static String baseName(String fileName) {
        int dot = fileName.lastIndexOf('.');
        return dot > 0 ? fileName.substring(0, dot) : fileName;
    }
}
