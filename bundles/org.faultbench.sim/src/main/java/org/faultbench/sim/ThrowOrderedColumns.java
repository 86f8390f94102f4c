package org.faultbench.sim;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

/**
 * The fault-plane columns of one bounding fault in the order of their nominal throw, with the cut-off depths of the
 * realisation being searched. A realisation scales every throw of a fault by the same factor and moves both walls of
 * a column by the same depth error, so this order holds in every realisation: when both walls hang the same column,
 * the columns where a footwall unit faces a hanging-wall unit form one stretch of it, found by binary search, and a
 * leak search visits the windows that exist instead of walking every unit boundary of every column. Within a stretch,
 * blocks of {@value #BLOCK} positions keep their shallowest footwall cut-off, so that a search can pass over a block
 * whose windows all start too deep to matter ({@link #blockShallowestFootwall}).
 *
 * <p>Not thread-safe: one per worker and fault; it keeps the cut-offs of the realisation last given.
 */
final class ThrowOrderedColumns {
    /** Positions per block of {@link #blockShallowestFootwall}. */
    static final int BLOCK = 32;

    private final FaultPlaneFrame frame;
    /** Columns with data, by nominal throw (hanging-wall minus footwall cut-off), ascending. */
    private final int[] order;
    /** Nominal throw of each column in {@link #order}, the difference the simulator scales. */
    private final double[] nominalThrow;
    /** Nominal footwall cut-off of each column in {@link #order}: read in order, not gathered by column. */
    private final double[] nominalFootwall;
    // the realisation: by position in {@link #order}
    private final double[] footwall;
    private final double[] hangingWall;
    private final double[] scaledThrow;
    /** Per block of {@value #BLOCK} positions, the shallowest footwall cut-off. */
    private final double[] blockShallowestFootwall;
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
        nominalFootwall = Arrays.stream(order).mapToDouble(k -> frame.footwall[k]).toArray();
        footwall = new double[order.length];
        hangingWall = new double[order.length];
        scaledThrow = new double[order.length];
        blockShallowestFootwall = new double[(order.length + BLOCK - 1) / BLOCK];
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
        boolean notANumber = false;
        boolean constantError = in.residual() == null;
        double error = in.depthError(0, 0);
        for (int from = 0; from < order.length; from += BLOCK) {
            double shallowest = Double.POSITIVE_INFINITY;
            for (int p = from, to = Math.min(order.length, from + BLOCK); p < to; p++) {
                double zFw = nominalFootwall[p]
                        + (constantError ? error : in.depthError(frame.x[order[p]], frame.y[order[p]]));
                double throwK = scale * nominalThrow[p];
                double zHw = zFw + throwK;
                footwall[p] = zFw;
                hangingWall[p] = zHw;
                scaledThrow[p] = throwK;
                // comparisons, not Math.max, which waits for NaN checks each step: NaN is caught apart
                double larger = Math.abs(zFw) > Math.abs(zHw) ? Math.abs(zFw) : Math.abs(zHw);
                largest = larger > largest ? larger : largest;
                notANumber |= zFw != zFw | zHw != zHw;
                shallowest = zFw < shallowest ? zFw : shallowest;
            }
            blockShallowestFootwall[from / BLOCK] = shallowest;
        }
        magnitude = largest;
        return !notANumber && Double.isFinite(largest) && !(scale < 0) && Double.isFinite(scale);
    }

    int count() {
        return order.length;
    }

    /** The fault-plane column at position p. */
    int column(int p) {
        return order[p];
    }

    /** Footwall cut-off depths by position, of the realisation last given; for hot loops, read only. */
    double[] footwalls() {
        return footwall;
    }

    /** Hanging-wall cut-off depths by position, of the realisation last given; for hot loops, read only. */
    double[] hangingWalls() {
        return hangingWall;
    }

    /** The realisation's throws by position, ascending (the factor is never negative when {@link #realise} holds). */
    double[] scaledThrows() {
        return scaledThrow;
    }

    /**
     * The shallowest footwall cut-off of the block of positions {@code block · BLOCK ..}: with the block's least
     * throw, a lower bound of every depth the block's windows start at, rounding included, since adding doubles
     * never lets a larger operand give a smaller rounded sum.
     */
    double blockShallowestFootwall(int block) {
        return blockShallowestFootwall[block];
    }

    /** The end of the block that position {@code from} lies in, or {@code end} when that comes first. */
    int blockEnd(int from, int end) {
        return Math.min(end, (from / BLOCK + 1) * BLOCK);
    }

    /** The fault-plane column of every position; for hot loops, read only. */
    int[] columnsInOrder() {
        return order;
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
        return positionsBelow(throwValue - margin(boundaryMagnitude));
    }

    /** The first position whose throw lies above {@code throwValue} plus the margin of {@link #firstFrom}. */
    int firstAbove(double throwValue, double boundaryMagnitude) {
        // a finite throw is at or below the limit exactly when it is below the next double up
        return positionsBelow(Math.nextUp(throwValue + margin(boundaryMagnitude)));
    }

    /**
     * How many throws lie below {@code limit}: a binary search whose steps select instead of branch, since which half
     * holds the answer is a coin toss the processor would mispredict half the time.
     */
    private int positionsBelow(double limit) {
        int n = scaledThrow.length;
        if (n == 0) {
            return 0;
        }
        int base = 0; // the answer lies in base .. base + n
        while (n > 1) {
            int half = n >>> 1;
            base = scaledThrow[base + half - 1] < limit ? base + half : base;
            n -= half;
        }
        return scaledThrow[base] < limit ? base + 1 : base;
    }

    /** A millionth of a millimetre per kilometre: thousands of times any rounding of a few additions. */
    private double margin(double boundaryMagnitude) {
        return 1e-9 * Math.max(1, magnitude + boundaryMagnitude);
    }
}
