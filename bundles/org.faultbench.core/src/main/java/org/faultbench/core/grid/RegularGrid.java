package org.faultbench.core.grid;

import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;

/**
 * An immutable map grid of one value per node (a depth or thickness surface), NaN marking a null node where the
 * surface is not defined. Node positions follow {@link GridGeometry}: node = cell centre.
 */
public final class RegularGrid {
    private final GridGeometry geometry;
    private final double[] values;

    /**
     * @param geometry node positions
     * @param values one value per node in row-major order (index = j&middot;nx + i); NaN = null node; copied
     */
    public RegularGrid(GridGeometry geometry, double[] values) {
        this.values = checkedCopy(geometry, values);
        this.geometry = geometry;
    }

    private static double[] checkedCopy(GridGeometry geometry, double[] values) {
        if (geometry == null) {
            throw new IllegalArgumentException("grid geometry is missing");
        }
        if (values == null || values.length != geometry.size()) {
            throw new IllegalArgumentException("a " + geometry.nx() + " x " + geometry.ny() + " grid needs "
                    + geometry.size() + " values, was " + (values == null ? "none" : values.length));
        }
        double[] copy = values.clone();
        for (int k = 0; k < copy.length; k++) {
            if (Double.isInfinite(copy[k])) {
                throw new IllegalArgumentException("grid value at node (" + geometry.column(k) + ", "
                        + geometry.row(k) + ") must be a finite number or NaN (null node), was " + copy[k]);
            }
        }
        return copy;
    }

    /** A grid whose node values are {@code valueAt(x, y)} at the node positions, for analytic or constant surfaces. */
    public static RegularGrid sample(GridGeometry geometry, DoubleBinaryOperator valueAt) {
        double[] values = new double[geometry.size()];
        for (int k = 0; k < values.length; k++) {
            values[k] = valueAt.applyAsDouble(geometry.x(geometry.column(k)), geometry.y(geometry.row(k)));
        }
        return new RegularGrid(geometry, values);
    }

    public GridGeometry geometry() {
        return geometry;
    }

    public int nx() {
        return geometry.nx();
    }

    public int ny() {
        return geometry.ny();
    }

    /** Map x of column i. */
    public double x(int i) {
        return geometry.x(i);
    }

    /** Map y of row j. */
    public double y(int j) {
        return geometry.y(j);
    }

    /** Area each node stands for, square metres. */
    public double cellArea() {
        return geometry.cellArea();
    }

    /** Value of node (i, j); NaN for a null node. */
    public double value(int i, int j) {
        return values[geometry.index(i, j)];
    }

    /** Value of the node with row-major index {@code index}; NaN for a null node. */
    public double value(int index) {
        return values[index];
    }

    /** Whether the node with row-major index {@code index} is null. */
    public boolean isNull(int index) {
        return Double.isNaN(values[index]);
    }

    /** A copy of all node values in row-major order. */
    public double[] values() {
        return values.clone();
    }

    /**
     * Bilinear interpolation between the four nodes around (x, y). Returns NaN outside the rectangle spanned by the
     * outer node centres (the half cell beyond them has no neighbour to interpolate with) and wherever one of the four
     * nodes is null, so a surface is never invented across a gap.
     */
    public double interpolate(double x, double y) {
        double tx = (x - geometry.x0()) / geometry.dx();
        double ty = (y - geometry.y0()) / geometry.dy();
        if (!(tx >= 0 && tx <= nx() - 1 && ty >= 0 && ty <= ny() - 1)) {
            return Double.NaN;
        }
        int i = Math.min((int) tx, nx() - 2);
        int j = Math.min((int) ty, ny() - 2);
        double fx = tx - i;
        double fy = ty - j;
        int k = geometry.index(i, j);
        double v00 = values[k];
        double v10 = values[k + 1];
        double v01 = values[k + nx()];
        double v11 = values[k + nx() + 1];
        if (Double.isNaN(v00) || Double.isNaN(v10) || Double.isNaN(v01) || Double.isNaN(v11)) {
            return Double.NaN;
        }
        return (1 - fy) * ((1 - fx) * v00 + fx * v10) + fy * ((1 - fx) * v01 + fx * v11);
    }

    /** A grid with {@code operator} applied to every non-null node; null nodes stay null. */
    public RegularGrid map(DoubleUnaryOperator operator) {
        double[] result = new double[values.length];
        for (int k = 0; k < values.length; k++) {
            result[k] = Double.isNaN(values[k]) ? Double.NaN : operator.applyAsDouble(values[k]);
        }
        return new RegularGrid(geometry, result);
    }

    /** Node-by-node sum, e.g. top + isochore = base; null where either grid is null. */
    public RegularGrid plus(RegularGrid other) {
        if (other == null) {
            throw new IllegalArgumentException("grid to add is missing");
        }
        geometry.requireSame(other.geometry, "grid to add");
        double[] result = new double[values.length];
        for (int k = 0; k < values.length; k++) {
            result[k] = values[k] + other.values[k];
        }
        return new RegularGrid(geometry, result);
    }
}
