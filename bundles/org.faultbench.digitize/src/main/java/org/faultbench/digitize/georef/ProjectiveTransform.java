package org.faultbench.digitize.georef;

import java.util.Locale;
import java.util.Optional;

/**
 * Projective transform (homography) of a scanned map, for a map photographed or scanned at an angle:
 * <pre>
 * x = (a·col + b·row + c) / (g·col + h·row + 1)
 * y = (d·col + e·row + f) / (g·col + h·row + 1)
 * </pre>
 * With g = h = 0 it is the affine transform. The inverse is the same kind of map, taken from the adjugate of the
 * 3×3 matrix [[a, b, c], [d, e, f], [g, h, 1]].
 */
public record ProjectiveTransform(double a, double b, double c, double d, double e, double f, double g, double h)
        implements GeoTransform {

    public ProjectiveTransform {
        double[] all = { a, b, c, d, e, f, g, h };
        for (int i = 0; i < all.length; i++) {
            if (!Double.isFinite(all[i])) {
                throw new IllegalArgumentException("projective parameter " + "abcdefgh".charAt(i)
                        + " must be a finite number, was " + all[i]);
            }
        }
        double det = a * (e - f * h) - b * (d - f * g) + c * (d * h - e * g);
        if (det == 0) {
            throw new IllegalArgumentException("projective transform is singular (its 3×3 matrix has determinant 0)");
        }
    }

    /**
     * @throws IllegalArgumentException if the pixel lies on the vanishing line (g·col + h·row + 1 = 0), whose image
     *         is at infinity
     */
    @Override
    public double[] toMap(double col, double row) {
        double w = g * col + h * row + 1;
        if (w == 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "pixel (%s, %s) lies on the vanishing line of the projective transform; it has no map position",
                    col, row));
        }
        return new double[] { (a * col + b * row + c) / w, (d * col + e * row + f) / w };
    }

    @Override
    public double[] toPixel(double x, double y) {
        double w = (d * h - e * g) * x + (b * g - a * h) * y + (a * e - b * d);
        if (w == 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "map point (%s, %s) is at infinity in the image of the projective transform; it has no pixel",
                    x, y));
        }
        double colTimesW = (e - f * h) * x + (c * h - b) * y + (b * f - c * e);
        double rowTimesW = (f * g - d) * x + (a - c * g) * y + (c * d - a * f);
        return new double[] { colTimesW / w, rowTimesW / w };
    }

    @Override
    public TransformKind kind() {
        return TransformKind.PROJECTIVE;
    }

    @Override
    public Optional<WorldFile> asWorldFile() {
        return Optional.empty();
    }
}
