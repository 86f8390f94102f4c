package org.faultbench.digitize.georef;

import java.util.Optional;

/**
 * Helmert (similarity) transform of a scanned map: one scale, one rotation and a shift, so shapes are kept. Image
 * rows run down while map y runs north, so the rotation acts on (col, −row):
 * <pre>
 * x = s·cos θ·col + s·sin θ·row + x0
 * y = s·sin θ·col − s·cos θ·row + y0
 * </pre>
 * A north-up scan has θ = 0.
 *
 * @param scale map units per pixel, &gt; 0
 * @param rotation direction of the image's column axis (rightwards) on the map, radians counter-clockwise from map x
 * @param shiftX map x of pixel (0, 0)
 * @param shiftY map y of pixel (0, 0)
 */
public record SimilarityTransform(double scale, double rotation, double shiftX, double shiftY) implements GeoTransform {

    public SimilarityTransform {
        if (!(scale > 0) || Double.isInfinite(scale)) {
            throw new IllegalArgumentException("similarity scale must be a finite number > 0, was " + scale);
        }
        if (!Double.isFinite(rotation) || !Double.isFinite(shiftX) || !Double.isFinite(shiftY)) {
            throw new IllegalArgumentException("similarity rotation and shifts must be finite numbers, were "
                    + rotation + ", " + shiftX + ", " + shiftY);
        }
    }

    /** The same transform in world-file form: A = −E = s·cos θ, B = D = s·sin θ, C = x0, F = y0. */
    public WorldFile worldFile() {
        double cos = scale * Math.cos(rotation);
        double sin = scale * Math.sin(rotation);
        return new WorldFile(cos, sin, sin, -cos, shiftX, shiftY);
    }

    @Override
    public double[] toMap(double col, double row) {
        return worldFile().toMap(col, row);
    }

    @Override
    public double[] toPixel(double x, double y) {
        return worldFile().toPixel(x, y);
    }

    @Override
    public TransformKind kind() {
        return TransformKind.SIMILARITY;
    }

    @Override
    public Optional<WorldFile> asWorldFile() {
        return Optional.of(worldFile());
    }
}
