package org.faultbench.digitize.georef;

import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * Least-squares solutions for one design matrix built from normalised pixel coordinates, refused when the control
 * points do not fix the parameters (rank deficiency, seen as a vanishing singular value).
 */
final class LeastSquaresDesign {

    private final DecompositionSolver solver;

    /**
     * @param design one row per equation, one column per parameter, at least as many rows as columns
     * @throws IllegalArgumentException if the control points leave some parameter free
     */
    LeastSquaresDesign(RealMatrix design, TransformKind kind, int pointCount) {
        SingularValueDecomposition svd = new SingularValueDecomposition(design);
        double[] s = svd.getSingularValues();
        if (s[s.length - 1] <= ControlPointLayout.RELATIVE_SINGULAR_VALUE_FLOOR * s[0]) {
            throw FitErrors.degenerate(kind, pointCount, "they leave the transform undetermined (for a "
                    + "second-order polynomial: all on one conic, such as a circle or two lines)");
        }
        solver = svd.getSolver();
    }

    /** The parameters that minimise the sum of squared differences to the right-hand side. */
    double[] solve(double[] rightHandSide) {
        return solver.solve(new ArrayRealVector(rightHandSide, false)).toArray();
    }
}
