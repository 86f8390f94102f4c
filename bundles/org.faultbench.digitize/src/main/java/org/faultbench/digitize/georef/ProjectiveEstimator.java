package org.faultbench.digitize.georef;

import java.util.List;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.Pair;

/**
 * Projective fit in two steps, both in normalised coordinates: the normalised direct linear transform (DLT) gives
 * the homography that minimises an algebraic error, then Levenberg–Marquardt refines it to minimise the sum of
 * squared map residuals, the quantity the report's RMS measures (Hartley &amp; Zisserman 2003, Multiple View
 * Geometry, 2nd ed., ch. 4, algorithms 4.2 and 4.3).
 */
final class ProjectiveEstimator {

    private static final int MAX_EVALUATIONS = 1000;

    private ProjectiveEstimator() {
    }

    static ProjectiveTransform estimate(List<ControlPoint> points) {
        PointNormalization pixels = PointNormalization.ofPixels(points);
        PointNormalization map = PointNormalization.ofMap(points);
        int n = points.size();
        double[][] uv = new double[n][];
        double[] target = new double[2 * n];
        for (int i = 0; i < n; i++) {
            ControlPoint point = points.get(i);
            uv[i] = new double[] { pixels.normalX(point.col()), pixels.normalY(point.row()) };
            target[2 * i] = map.normalX(point.x());
            target[2 * i + 1] = map.normalY(point.y());
        }
        return inPixelsAndMapUnits(refine(directLinearTransform(uv, target, n), uv, target), pixels, map);
    }

    /** Undoes both normalisations: H = T_map⁻¹ · H_normalised · T_pixels, scaled so its last entry is 1. */
    private static ProjectiveTransform inPixelsAndMapUnits(double[] m, PointNormalization pixels,
            PointNormalization map) {
        RealMatrix normalised = MatrixUtils.createRealMatrix(new double[][] {
                { m[0], m[1], m[2] }, { m[3], m[4], m[5] }, { m[6], m[7], 1 } });
        double[][] h = map.inverseMatrix().multiply(normalised).multiply(pixels.matrix()).getData();
        double w = h[2][2];
        return new ProjectiveTransform(h[0][0] / w, h[0][1] / w, h[0][2] / w, h[1][0] / w, h[1][1] / w,
                h[1][2] / w, h[2][0] / w, h[2][1] / w);
    }

    /**
     * The null vector of the DLT matrix (two rows per point), scaled so its last entry is 1. Zero rows pad the
     * matrix to 9 rows for the 4-point case, because the SVD returns only min(rows, columns) singular vectors.
     */
    private static double[] directLinearTransform(double[][] uv, double[] target, int n) {
        RealMatrix a = MatrixUtils.createRealMatrix(Math.max(2 * n, 9), 9);
        for (int i = 0; i < n; i++) {
            double u = uv[i][0];
            double v = uv[i][1];
            double x = target[2 * i];
            double y = target[2 * i + 1];
            a.setRow(2 * i, new double[] { -u, -v, -1, 0, 0, 0, u * x, v * x, x });
            a.setRow(2 * i + 1, new double[] { 0, 0, 0, -u, -v, -1, u * y, v * y, y });
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(a);
        double[] h = svd.getV().getColumn(8);
        requireUniqueAndRegular(svd.getSingularValues(), h, n);
        double[] start = new double[8];
        for (int j = 0; j < 8; j++) {
            start[j] = h[j] / h[8];
        }
        return start;
    }

    /**
     * The DLT fixes the homography only if its null space is one-dimensional (second-smallest singular value clear
     * of zero) and the homography found is regular. It must also keep the centroid of the control pixels at a finite
     * map position: a horizon running through the middle of the control points is no photographed map.
     */
    private static void requireUniqueAndRegular(double[] singularValues, double[] h, int n) {
        RealMatrix homography = MatrixUtils.createRealMatrix(new double[][] {
                { h[0], h[1], h[2] }, { h[3], h[4], h[5] }, { h[6], h[7], h[8] } });
        double floor = ControlPointLayout.RELATIVE_SINGULAR_VALUE_FLOOR;
        if (singularValues[7] <= floor * singularValues[0]
                || Math.abs(new LUDecomposition(homography).getDeterminant()) <= floor) {
            throw FitErrors.degenerate(TransformKind.PROJECTIVE, n, "three of them lie on one line (in the image or"
                    + " on the map), or they leave the transform otherwise undetermined");
        }
        if (Math.abs(h[8]) <= floor) {
            throw FitErrors.degenerate(TransformKind.PROJECTIVE, n,
                    "they put the horizon of the perspective through the middle of the control points");
        }
    }

    /** Levenberg–Marquardt on the 8 parameters (last matrix entry fixed at 1) against the normalised map positions. */
    private static double[] refine(double[] start, double[][] uv, double[] target) {
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(start)
                .target(target)
                .model(parameters -> valueAndJacobian(parameters, uv))
                .maxEvaluations(MAX_EVALUATIONS)
                .maxIterations(MAX_EVALUATIONS)
                .build();
        return new LevenbergMarquardtOptimizer().optimize(problem).getPoint().toArray();
    }

    /** Predicted normalised map positions of all points and their derivatives with respect to the 8 parameters. */
    private static Pair<RealVector, RealMatrix> valueAndJacobian(RealVector parameters, double[][] uv) {
        double[] m = parameters.toArray();
        RealVector value = new ArrayRealVector(2 * uv.length);
        RealMatrix jacobian = MatrixUtils.createRealMatrix(2 * uv.length, 8);
        for (int i = 0; i < uv.length; i++) {
            double u = uv[i][0];
            double v = uv[i][1];
            double w = m[6] * u + m[7] * v + 1;
            double x = (m[0] * u + m[1] * v + m[2]) / w;
            double y = (m[3] * u + m[4] * v + m[5]) / w;
            value.setEntry(2 * i, x);
            value.setEntry(2 * i + 1, y);
            jacobian.setRow(2 * i, new double[] { u / w, v / w, 1 / w, 0, 0, 0, -u * x / w, -v * x / w });
            jacobian.setRow(2 * i + 1, new double[] { 0, 0, 0, u / w, v / w, 1 / w, -u * y / w, -v * y / w });
        }
        return new Pair<>(value, jacobian);
    }
}
