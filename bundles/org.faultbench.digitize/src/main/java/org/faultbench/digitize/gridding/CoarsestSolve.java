package org.faultbench.digitize.gridding;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * Direct solution on the coarsest multigrid level, by the pseudo-inverse from a singular value decomposition.
 * <p>
 * Why a pseudo-inverse: a fault block holding fewer than three data points not on a line has no unique
 * minimum-curvature surface (its tilt is free), so the coarse operator can be singular; the pseudo-inverse then
 * adds no correction along the free directions instead of failing. Singular values below {@value #RELATIVE_CUTOFF}
 * times the largest count as zero.
 */
final class CoarsestSolve {
    private static final double RELATIVE_CUTOFF = 1e-10;

    private final int[] nodes;
    private final double[][] inverse;

    CoarsestSolve(GridMatrix a) {
        int n = a.size();
        int[] index = new int[n];
        int count = 0;
        for (int k = 0; k < n; k++) {
            index[k] = a.unknown(k) ? count++ : -1;
        }
        nodes = new int[count];
        for (int k = 0; k < n; k++) {
            if (index[k] >= 0) {
                nodes[index[k]] = k;
            }
        }
        inverse = count == 0 ? new double[0][0] : pseudoInverse(denseMatrix(a, index, count));
    }

    private static double[][] denseMatrix(GridMatrix a, int[] index, int count) {
        double[][] dense = new double[count][count];
        int[] columns = new int[GridMatrix.WINDOW];
        double[] weights = new double[GridMatrix.WINDOW];
        for (int k = 0; k < index.length; k++) {
            if (index[k] < 0) {
                continue;
            }
            int entries = a.row(k, columns, weights);
            for (int e = 0; e < entries; e++) {
                if (index[columns[e]] >= 0) {
                    dense[index[k]][index[columns[e]]] += weights[e];
                }
            }
        }
        return dense;
    }

    private static double[][] pseudoInverse(double[][] dense) {
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(dense, false));
        double[] sigma = svd.getSingularValues();
        double cutoff = RELATIVE_CUTOFF * sigma[0];
        RealMatrix v = svd.getV();
        RealMatrix ut = svd.getUT();
        int n = sigma.length;
        double[][] scaledV = v.getData();
        for (int col = 0; col < n; col++) {
            double factor = sigma[col] > cutoff ? 1 / sigma[col] : 0;
            for (int row = 0; row < scaledV.length; row++) {
                scaledV[row][col] *= factor;
            }
        }
        return new Array2DRowRealMatrix(scaledV, false).multiply(ut).getData();
    }

    /** x = A<sup>+</sup> b on the unknown nodes; 0 elsewhere. */
    void solve(double[] b, double[] x) {
        java.util.Arrays.fill(x, 0);
        for (int p = 0; p < nodes.length; p++) {
            double sum = 0;
            double[] row = inverse[p];
            for (int q = 0; q < nodes.length; q++) {
                sum += row[q] * b[nodes[q]];
            }
            x[nodes[p]] = sum;
        }
    }
}
