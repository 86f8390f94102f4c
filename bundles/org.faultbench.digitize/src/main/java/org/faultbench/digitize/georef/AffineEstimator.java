package org.faultbench.digitize.georef;

import java.util.List;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/** Least-squares affine fit: map x and map y are each a linear function of the normalised pixel position. */
final class AffineEstimator {

    private AffineEstimator() {
    }

    static AffineTransform estimate(List<ControlPoint> points) {
        PointNormalization pixels = PointNormalization.ofPixels(points);
        int n = points.size();
        RealMatrix design = MatrixUtils.createRealMatrix(n, 3);
        for (int i = 0; i < n; i++) {
            ControlPoint point = points.get(i);
            design.setRow(i, new double[] { pixels.normalX(point.col()), pixels.normalY(point.row()), 1 });
        }
        LeastSquaresDesign fit = new LeastSquaresDesign(design, TransformKind.AFFINE, n);
        double[] x = fit.solve(points.stream().mapToDouble(ControlPoint::x).toArray());
        double[] y = fit.solve(points.stream().mapToDouble(ControlPoint::y).toArray());
        double[] xRow = pixels.pullBack(x[0], x[1], x[2]);
        double[] yRow = pixels.pullBack(y[0], y[1], y[2]);
        return new AffineTransform(new WorldFile(xRow[0], yRow[0], xRow[1], yRow[1], xRow[2], yRow[2]));
    }
}
