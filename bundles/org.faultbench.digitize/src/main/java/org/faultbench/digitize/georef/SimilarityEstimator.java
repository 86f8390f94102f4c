package org.faultbench.digitize.georef;

import java.util.List;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Least-squares Helmert fit. Unknowns (p, q, x0, y0) with x = p·u + q·v + x0 and y = q·u − p·v + y0 in normalised
 * pixel coordinates; each point gives one x row and one y row of the design matrix.
 */
final class SimilarityEstimator {

    private SimilarityEstimator() {
    }

    static SimilarityTransform estimate(List<ControlPoint> points) {
        PointNormalization pixels = PointNormalization.ofPixels(points);
        int n = points.size();
        RealMatrix design = MatrixUtils.createRealMatrix(2 * n, 4);
        double[] map = new double[2 * n];
        for (int i = 0; i < n; i++) {
            ControlPoint point = points.get(i);
            double u = pixels.normalX(point.col());
            double v = pixels.normalY(point.row());
            design.setRow(2 * i, new double[] { u, v, 1, 0 });
            design.setRow(2 * i + 1, new double[] { -v, u, 0, 1 });
            map[2 * i] = point.x();
            map[2 * i + 1] = point.y();
        }
        double[] solution = new LeastSquaresDesign(design, TransformKind.SIMILARITY, n).solve(map);
        double[] xRow = pixels.pullBack(solution[0], solution[1], solution[2]);
        double[] yRow = pixels.pullBack(solution[1], -solution[0], solution[3]);
        return new SimilarityTransform(Math.hypot(xRow[0], xRow[1]), Math.atan2(xRow[1], xRow[0]), xRow[2], yRow[2]);
    }
}
