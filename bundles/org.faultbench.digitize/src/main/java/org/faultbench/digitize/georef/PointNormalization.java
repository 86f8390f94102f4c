package org.faultbench.digitize.georef;

import java.util.List;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Shift and isotropic scale that move a point set's centroid to the origin and make the mean distance from it √2.
 * Fitting in these coordinates keeps the design matrices well conditioned whatever the image size or the map
 * coordinates' magnitude, and makes a relative rank threshold meaningful (Hartley &amp; Zisserman 2003, Multiple View
 * Geometry, 2nd ed., section 4.4.4, "normalizing transformations").
 *
 * @param centreX centroid x (or column)
 * @param centreY centroid y (or row)
 * @param scale factor applied after the shift; 0 when all points coincide
 */
record PointNormalization(double centreX, double centreY, double scale) {

    /** Normalisation of the control points' pixel positions. */
    static PointNormalization ofPixels(List<ControlPoint> points) {
        return of(points.stream().map(p -> new double[] { p.col(), p.row() }).toList());
    }

    /** Normalisation of the control points' map positions. */
    static PointNormalization ofMap(List<ControlPoint> points) {
        return of(points.stream().map(p -> new double[] { p.x(), p.y() }).toList());
    }

    /** Normalisation of points given as {x, y} pairs. */
    static PointNormalization of(List<double[]> points) {
        double cx = points.stream().mapToDouble(p -> p[0]).average().orElseThrow();
        double cy = points.stream().mapToDouble(p -> p[1]).average().orElseThrow();
        double meanDistance = points.stream().mapToDouble(p -> Math.hypot(p[0] - cx, p[1] - cy)).average().orElseThrow();
        return new PointNormalization(cx, cy, meanDistance > 0 ? Math.sqrt(2) / meanDistance : 0);
    }

    /** Whether the points are all at one place (no direction or scale can be taken from them). */
    boolean coincident() {
        return scale == 0;
    }

    double normalX(double x) {
        return scale * (x - centreX);
    }

    double normalY(double y) {
        return scale * (y - centreY);
    }

    /** The normalisation as a 3×3 homogeneous matrix. */
    RealMatrix matrix() {
        return MatrixUtils.createRealMatrix(new double[][] {
                { scale, 0, -scale * centreX }, { 0, scale, -scale * centreY }, { 0, 0, 1 } });
    }

    /** The inverse of {@link #matrix()}: from normalised back to original coordinates. */
    RealMatrix inverseMatrix() {
        return MatrixUtils.createRealMatrix(new double[][] {
                { 1 / scale, 0, centreX }, { 0, 1 / scale, centreY }, { 0, 0, 1 } });
    }

    /**
     * Rewrites a linear function {@code cu·u + cv·v + c1} of the normalised coordinates as {cx, cy, c0} acting on
     * the original coordinates.
     */
    double[] pullBack(double cu, double cv, double c1) {
        return new double[] { cu * scale, cv * scale, c1 - scale * (cu * centreX + cv * centreY) };
    }
}
