package org.faultbench.sim;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

/**
 * The fault-plane columns of one bounding fault in the order of their nominal throw, with the cut-off depths of the
 * realisation being searched. A realisation scales every throw of a fault by the same factor and moves both walls of
 * a column by the same depth error, so this order holds in every realisation: when both walls hang the same column,
 * the columns where a footwall unit faces a hanging-wall unit form one stretch of it, found by binary search, and a
 * leak search visits the windows that exist instead of walking every unit boundary of every column.
 *
 * <p>Not thread-safe: one per worker and fault; it keeps the cut-offs of the realisation last given.
 */
final class ThrowOrderedColumns {
    private final FaultPlaneFrame frame;
    /** Columns with data, by nominal throw (hanging-wall minus footwall cut-off), ascending. */
    private final int[] order;
    /** Nominal throw of each column in {@link #order}, the difference the simulator scales. */
    private final double[] nominalThrow;
    // the realisation: by position in {@link #order}
    private final double[] footwall;
    private final double[] hangingWall;
    private final double[] scaledThrow;
    private double magnitude;

    ThrowOrderedColumns(FaultPlaneFrame frame) {
        this.frame = frame;
        double[] differences = new double[frame.columns];
        for (int k = 0; k < frame.columns; k++) {
            differences[k] = frame.hangingWall[k] - frame.footwall[k];
        }
        order = IntStream.range(0, frame.columns).filter(k -> frame.hasData[k]).boxed()
                .sorted(Comparator.comparingDouble(k -> differences[k])).mapToInt(Integer::intValue).toArray();
        nominalThrow = Arrays.stream(order).mapToDouble(k -> differences[k]).toArray();
        footwall = new double[order.length];
        hangingWall = new double[order.length];
        scaledThrow = new double[order.length];
    }

    /**
     * Takes the cut-offs of a realisation, with the expressions of the column-by-column search so that every depth is
     * the same double.
     *
     * @return false when a cut-off is not a finite number (the caller then takes the column-by-column path, which
     *         reports it)
     */
    boolean realise(RealisationInputs in, double scale) {
        double largest = 0;
        boolean constantError = in.residual() == null;
        double error = in.depthError(0, 0);
        for (int p = 0; p < order.length; p++) {
            int k = order[p];
            double zFw = frame.footwall[k] + (constantError ? error : in.depthError(frame.x[k], frame.y[k]));
            double throwK = scale * nominalThrow[p];
            double zHw = zFw + throwK;
            footwall[p] = zFw;
            hangingWall[p] = zHw;
            scaledThrow[p] = throwK;
            largest = Math.max(largest, Math.max(Math.abs(zFw), Math.abs(zHw)));
        }
        magnitude = largest;
        return Double.isFinite(largest) && !(scale < 0) && Double.isFinite(scale);
    }

    int count() {
        return order.length;
    }

    /** The fault-plane column at position p. */
    int column(int p) {
        return order[p];
    }

    double footwall(int p) {
        return footwall[p];
    }

    double hangingWall(int p) {
        return hangingWall[p];
    }

    /**
     * The first position whose throw is not below {@code throwValue} less a margin far wider than the rounding of
     * cut-off depths plus unit boundaries; {@link #count()} when none.
     */
    int firstFrom(double throwValue, double boundaryMagnitude) {
        double limit = throwValue - margin(boundaryMagnitude);
        int low = 0;
        int high = order.length;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (scaledThrow[mid] < limit) {
                low = mid + 1;
            } else {
                high = mid;
            }
        }
        return low;
    }

    /** The first position whose throw lies above {@code throwValue} plus the margin of {@link #firstFrom}. */
    int firstAbove(double throwValue, double boundaryMagnitude) {
        double limit = throwValue + margin(boundaryMagnitude);
        int low = 0;
        int high = order.length;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (scaledThrow[mid] <= limit) {
                low = mid + 1;
            } else {
                high = mid;
            }
        }
        return low;
    }

    /** A millionth of a millimetre per kilometre: thousands of times any rounding of a few additions. */
    private double margin(double boundaryMagnitude) {
        return 1e-9 * Math.max(1, magnitude + boundaryMagnitude);
    }
}
