package org.faultbench.sim;

import java.util.List;

/**
 * Counts, for a block of realisations, in how many of them each fault-plane cell leaks, from the depth runs of leaking
 * cells rather than cell by cell: a run of rows {@code [first, end)} in a column adds +1 at {@code first} and -1 at
 * {@code end} of that column's difference array, so a realisation costs O(runs), not O(cells). The counts are the
 * running sums down each column ({@link #addTo}, {@link #count}).
 *
 * <p>A block holds at most {@value #MAX_REALISATIONS} realisations: within one realisation the runs of a column are
 * disjoint, so each entry moves by at most one per realisation and fits a byte.
 */
final class LeakRuns {
    /** Realisations a block may hold so that every difference fits a byte. */
    static final int MAX_REALISATIONS = Byte.MAX_VALUE;

    /** Per fault, column by column, {@code rows + 1} differences per column (the last one takes the ends at the base). */
    private final byte[][] differences;
    private final int[] stride;

    LeakRuns(List<FaultPlaneFrame> faults) {
        differences = new byte[faults.size()][];
        stride = new int[faults.size()];
        for (FaultPlaneFrame frame : faults) {
            stride[frame.index] = frame.rows + 1;
            differences[frame.index] = new byte[frame.columns * (frame.rows + 1)];
        }
    }

    /** Rows {@code first .. end - 1} of a column of fault {@code fault} leak in one more realisation. */
    void addRun(int fault, int column, int first, int end) {
        if (first < end) {
            byte[] d = differences[fault];
            int base = column * stride[fault];
            d[base + first]++;
            d[base + end]--;
        }
    }

    /**
     * The differences of fault {@code fault}, {@code rows + 1} per column from {@code column · (rows + 1)}, for a loop
     * over millions of windows that adds its runs with {@link #addRunOrNothing}.
     */
    byte[] differences(int fault) {
        return differences[fault];
    }

    /**
     * {@link #addRun} on the differences of one fault without a branch: a run that is empty ({@code end <= first})
     * adds and takes one at the same place. A byte may pass its limit in between, but wraps back: the sum stays exact.
     *
     * @param columnStart {@code column · (rows + 1)}
     */
    static void addRunOrNothing(byte[] differences, int columnStart, int first, int end) {
        differences[columnStart + first]++;
        differences[columnStart + Math.max(first, end)]--;
    }

    /**
     * Adds this block's differences to running totals laid out the same way ({@link #newTotals}); summing the
     * differences of blocks and integrating once gives the same counts as integrating each block.
     */
    void addTo(long[][] totals) {
        for (int f = 0; f < differences.length; f++) {
            byte[] d = differences[f];
            long[] t = totals[f];
            for (int i = 0; i < d.length; i++) {
                t[i] += d[i];
            }
        }
    }

    /** Zeroed totals for {@link #addTo}. */
    static long[][] newTotals(List<FaultPlaneFrame> faults) {
        long[][] totals = new long[faults.size()][];
        for (FaultPlaneFrame frame : faults) {
            totals[frame.index] = new long[frame.columns * (frame.rows + 1)];
        }
        return totals;
    }

    /** Counts of this block, row-major (row · columns + column) as in {@link LeakProbabilityMap}. */
    long[] counts(FaultPlaneFrame frame) {
        long[][] totals = newTotals(List.of(frame));
        long[] own = totals[0];
        byte[] d = differences[frame.index];
        for (int i = 0; i < d.length; i++) {
            own[i] = d[i];
        }
        return integrate(frame, own);
    }

    /** Running sums down each column of differences laid out as here: counts row-major (row · columns + column). */
    static long[] integrate(FaultPlaneFrame frame, long[] differences) {
        long[] counts = new long[frame.cells()];
        int stride = frame.rows + 1;
        for (int column = 0; column < frame.columns; column++) {
            long running = 0;
            for (int row = 0; row < frame.rows; row++) {
                running += differences[column * stride + row];
                counts[row * frame.columns + column] = running;
            }
        }
        return counts;
    }
}
