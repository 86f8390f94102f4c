package org.faultbench.digitize.georef;

import java.util.List;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * Rejects control-point layouts that cannot fix a transform, before any fitting, so the user is told what is wrong
 * with the points rather than that a matrix is singular.
 */
final class ControlPointLayout {

    /** Below this ratio of the smallest to the largest singular value, normalised coordinates count as degenerate. */
    static final double RELATIVE_SINGULAR_VALUE_FLOOR = 1e-10;

    private ControlPointLayout() {
    }

    /**
     * Checks the enabled points: at least the minimum number, not all at one place, and (for every type needing three
     * or more points; not the similarity, which fixes only a scale and an angle) not all on one line, in the image or
     * on the map.
     */
    static void check(TransformType kind, List<ControlPoint> enabled) {
        if (enabled.size() < kind.minimumPoints()) {
            throw FitErrors.tooFew(kind, enabled.size());
        }
        checkSide(kind, enabled.size(), enabled.stream().map(p -> new double[] { p.col(), p.row() }).toList(),
                "pixel", "in the image");
        checkSide(kind, enabled.size(), enabled.stream().map(p -> new double[] { p.x(), p.y() }).toList(),
                "map position", "on the map");
    }

    private static void checkSide(TransformType kind, int count, List<double[]> points, String place, String where) {
        PointNormalization normalization = PointNormalization.of(points);
        if (normalization.coincident()) {
            throw FitErrors.degenerate(kind, count, "they all sit at one " + place);
        }
        if (kind.refusesCollinearPoints() && onOneLine(points, normalization)) {
            throw FitErrors.degenerate(kind, count, "they lie on one line " + where);
        }
    }

    private static boolean onOneLine(List<double[]> points, PointNormalization normalization) {
        RealMatrix centred = MatrixUtils.createRealMatrix(points.size(), 2);
        for (int i = 0; i < points.size(); i++) {
            centred.setEntry(i, 0, normalization.normalX(points.get(i)[0]));
            centred.setEntry(i, 1, normalization.normalY(points.get(i)[1]));
        }
        double[] s = new SingularValueDecomposition(centred).getSingularValues();
        return s[1] <= RELATIVE_SINGULAR_VALUE_FLOOR * s[0];
    }
}
