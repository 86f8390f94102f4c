package org.faultbench.digitize.georef;

import java.util.Objects;
import java.util.Optional;

/**
 * Affine transform of a scanned map, held as the world file it is equivalent to (x = A·col + B·row + C,
 * y = D·col + E·row + F); independent scales and a shear absorb a scan that was stretched differently along and
 * across the paper.
 */
public record AffineTransform(WorldFile worldFile) implements GeoTransform {

    public AffineTransform {
        Objects.requireNonNull(worldFile, "worldFile");
    }

    @Override
    public double[] toMap(double col, double row) {
        return worldFile.toMap(col, row);
    }

    @Override
    public double[] toPixel(double x, double y) {
        return worldFile.toPixel(x, y);
    }

    @Override
    public TransformKind kind() {
        return TransformKind.AFFINE;
    }

    @Override
    public Optional<WorldFile> asWorldFile() {
        return Optional.of(worldFile);
    }
}
