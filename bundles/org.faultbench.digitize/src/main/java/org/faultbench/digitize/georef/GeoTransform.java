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

    /**
     * Which built-in kind of transform this is. Transforms of a contributed type (extension point
     * {@value TransformContributions#POINT}) have none and need not implement it; {@link FitReport#type()} names the
     * type of any fitted transform.
     *
     * @throws UnsupportedOperationException for a transform of a contributed type
     */
    default TransformKind kind() {
        throw new UnsupportedOperationException(getClass().getName() + " is a contributed transform type, not a "
                + "built-in kind");
    }

    /** The equivalent world file; present only for transforms a world file can hold (similarity and affine). */
    default Optional<WorldFile> asWorldFile() {
        return Optional.empty();
    }
}
