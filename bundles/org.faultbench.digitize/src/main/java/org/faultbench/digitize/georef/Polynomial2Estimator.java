package org.faultbench.digitize.georef;

import java.util.List;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Least-squares second-order polynomial fit in normalised pixel coordinates (u, v), rewritten afterwards as a
 * polynomial of (col, row); the affine fit to the same points becomes the start of the inverse's Newton iteration.
 */
final class Polynomial2Estimator {

    private Polynomial2Estimator() {
    }

    static Polynomial2Transform estimate(List<ControlPoint> points) {
        PointNormalization pixels = PointNormalization.ofPixels(points);
        int n = points.size();
        RealMatrix design = MatrixUtils.createRealMatrix(n, 6);
        for (int i = 0; i < n; i++) {
            double u = pixels.normalX(points.get(i).col());
            double v = pixels.normalY(points.get(i).row());
            design.setRow(i, new double[] { 1, u, v, u * u, u * v, v * v });
        }
        LeastSquaresDesign fit = new LeastSquaresDesign(design, TransformKind.POLYNOMIAL_2, n);
        double[] x = fit.solve(points.stream().mapToDouble(ControlPoint::x).toArray());
        double[] y = fit.solve(points.stream().mapToDouble(ControlPoint::y).toArray());
        return new Polynomial2Transform(inPixels(x, pixels), inPixels(y, pixels),
                AffineEstimator.estimate(points).worldFile());
    }

    /** Expands n0 + n1·u + n2·v + n3·u² + n4·u·v + n5·v² with u = k·col + p, v = k·row + q. */
    private static QuadraticPolynomial inPixels(double[] n, PointNormalization pixels) {
        double k = pixels.scale();
        double p = -k * pixels.centreX();
        double q = -k * pixels.centreY();
        return new QuadraticPolynomial(
                n[0] + n[1] * p + n[2] * q + n[3] * p * p + n[4] * p * q + n[5] * q * q,
                k * (n[1] + 2 * n[3] * p + n[4] * q),
                k * (n[2] + n[4] * p + 2 * n[5] * q),
                k * k * n[3],
                k * k * n[4],
                k * k * n[5]);
    }
}
