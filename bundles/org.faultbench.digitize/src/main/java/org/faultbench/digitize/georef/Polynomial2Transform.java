package org.faultbench.digitize.georef;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * Second-order polynomial transform: each map coordinate is a quadratic in (col, row). It has no closed-form
 * inverse, so {@link #toPixel} solves it by Newton iteration started from an affine fit to the same control points.
 *
 * @param x map x as a polynomial of the pixel position
 * @param y map y as a polynomial of the pixel position
 * @param startEstimate affine approximation whose inverse starts the Newton iteration
 */
public record Polynomial2Transform(QuadraticPolynomial x, QuadraticPolynomial y, WorldFile startEstimate)
        implements GeoTransform {

    private static final int MAX_ITERATIONS = 50;
    /** Newton stops when a step moves the pixel by less than this (far below any digitizing precision). */
    private static final double PIXEL_TOLERANCE = 1e-6;
    /** ... or when the map misfit is down to this many units in the last place of the map coordinates. */
    private static final double ROUNDING_ULPS = 16;

    public Polynomial2Transform {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        Objects.requireNonNull(startEstimate, "startEstimate");
    }

    @Override
    public double[] toMap(double col, double row) {
        return new double[] { x.valueAt(col, row), y.valueAt(col, row) };
    }

    @Override
    public double[] toPixel(double mapX, double mapY) {
        double[] pixel = startEstimate.toPixel(mapX, mapY);
        double roundingLevel = ROUNDING_ULPS * Math.ulp(Math.max(Math.abs(mapX), Math.abs(mapY)));
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double misfitX = x.valueAt(pixel[0], pixel[1]) - mapX;
            double misfitY = y.valueAt(pixel[0], pixel[1]) - mapY;
            if (Math.hypot(misfitX, misfitY) <= roundingLevel) {
                return pixel;
            }
            double[] step = newtonStep(pixel[0], pixel[1], misfitX, misfitY);
            if (!Double.isFinite(step[0]) || !Double.isFinite(step[1])) {
                break;
            }
            pixel = new double[] { pixel[0] - step[0], pixel[1] - step[1] };
            if (Math.hypot(step[0], step[1]) < PIXEL_TOLERANCE) {
                return pixel;
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
                "map point (%s, %s) cannot be converted to a pixel: the second-order polynomial folds over there;"
                        + " it lies too far outside the control points", mapX, mapY));
    }

    /** Solves J·step = misfit, J being the 2×2 Jacobian of the polynomials at (c, r). */
    private double[] newtonStep(double c, double r, double misfitX, double misfitY) {
        double xc = x.slopeAlongCol(c, r);
        double xr = x.slopeAlongRow(c, r);
        double yc = y.slopeAlongCol(c, r);
        double yr = y.slopeAlongRow(c, r);
        double det = xc * yr - xr * yc;
        return new double[] { (yr * misfitX - xr * misfitY) / det, (xc * misfitY - yc * misfitX) / det };
    }

    @Override
    public TransformKind kind() {
        return TransformKind.POLYNOMIAL_2;
    }

    @Override
    public Optional<WorldFile> asWorldFile() {
        return Optional.empty();
    }
}
