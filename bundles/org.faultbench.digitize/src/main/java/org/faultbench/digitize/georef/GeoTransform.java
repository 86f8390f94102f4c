package org.faultbench.digitize.georef;

import java.util.Optional;

/**
 * A fitted mapping between pixel positions of a scanned map and map coordinates. Pixel (0, 0) is the centre of the
 * upper-left pixel; rows count downwards; map y counts upwards (north).
 */
public interface GeoTransform {

    /**
     * Map coordinates {x, y} of the pixel position (col, row).
     *
     * @throws IllegalArgumentException if the pixel has no map position (on the vanishing line of a projective
     *         transform)
     */
    double[] toMap(double col, double row);

    /**
     * Pixel position {col, row} of the map point (x, y).
     *
     * @throws IllegalArgumentException if the transform cannot be inverted at that point
     */
    double[] toPixel(double x, double y);

    /** Which kind of transform this is. */
    TransformKind kind();

    /** The equivalent world file; present only for transforms a world file can hold (similarity and affine). */
    Optional<WorldFile> asWorldFile();
}
