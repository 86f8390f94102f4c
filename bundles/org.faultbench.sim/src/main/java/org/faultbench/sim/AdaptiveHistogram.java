package org.faultbench.sim;

import java.util.Arrays;

/**
 * Histogram of one result quantity over a stream of realisations in constant memory: a fixed number of equal bins
 * whose range is chosen before the run. A value outside the range doubles the bin width and merges neighbouring
 * pairs (extending the range up, or down by its own length) until the value fits, so no value is ever clipped and
 * the bins stay nested: the counts are whole numbers, the same whatever the order of the values once the final range
 * is reached, and the range itself depends only on the sequence of values, which callers feed in realisation order.
 * Non-finite values (e.g. "no leak point") are counted apart, as in {@link StreamingSummary}.
 */
public final class AdaptiveHistogram {
    /** Bins used by the simulator: fine enough to read P90/P50/P10 to about 1 % of the range. */
    public static final int DEFAULT_BINS = 100;

    private final long[] counts;
    private double lower;
    private double width;
    private long nonFinite;
    private long finite;

    /**
     * @param lower lower edge of the first bin
     * @param width bin width, positive
     * @param bins number of bins, even and at least 2 (pairs are merged when the range grows)
     */
    public AdaptiveHistogram(double lower, double width, int bins) {
        if (bins < 2 || bins % 2 != 0) {
            throw new IllegalArgumentException("a histogram needs an even number of bins, at least 2, was " + bins);
        }
        if (!Double.isFinite(lower) || !(width > 0) || !Double.isFinite(width)) {
            throw new IllegalArgumentException("histogram range must start at a finite value with a positive bin width,"
                    + " was lower " + lower + ", width " + width);
        }
        this.counts = new long[bins];
        this.lower = lower;
        this.width = width;
    }

    /** Bins over [min, max); an empty or non-finite range becomes a unit range at min (or at 0). */
    public static AdaptiveHistogram over(double min, double max, int bins) {
        double lo = Double.isFinite(min) ? min : 0;
        double span = Double.isFinite(max) && max > lo ? max - lo : Math.max(1, Math.abs(lo) * 1e-3);
        return new AdaptiveHistogram(lo, span / bins, bins);
    }

    public void add(double value) {
        if (!Double.isFinite(value)) {
            nonFinite++;
            return;
        }
        while (value < lower) {
            growDown();
        }
        while (value >= upper()) {
            growUp();
        }
        int bin = (int) Math.floor((value - lower) / width);
        counts[Math.min(counts.length - 1, Math.max(0, bin))]++;
        finite++;
    }

    private void growUp() {
        int half = counts.length / 2;
        for (int i = 0; i < half; i++) {
            counts[i] = counts[2 * i] + counts[2 * i + 1];
        }
        Arrays.fill(counts, half, counts.length, 0);
        width *= 2;
    }

    private void growDown() {
        int half = counts.length / 2;
        for (int i = counts.length - 1; i >= half; i--) {
            int source = 2 * (i - half);
            counts[i] = counts[source] + counts[source + 1];
        }
        Arrays.fill(counts, 0, half, 0);
        lower -= counts.length * width;
        width *= 2;
    }

    public int bins() {
        return counts.length;
    }

    /** Lower edge of the first bin. */
    public double lower() {
        return lower;
    }

    /** Upper edge of the last bin (exclusive). */
    public double upper() {
        return lower + counts.length * width;
    }

    public double binWidth() {
        return width;
    }

    /** Lower edge of bin {@code i}. */
    public double binLower(int i) {
        return lower + i * width;
    }

    public long count(int bin) {
        return counts[bin];
    }

    /** A copy of the bin counts. */
    public long[] counts() {
        return counts.clone();
    }

    /** Values seen, finite or not: the realisations. */
    public long count() {
        return finite + nonFinite;
    }

    /** Finite values seen: the sum of the bin counts. */
    public long finiteCount() {
        return finite;
    }

    public long nonFiniteCount() {
        return nonFinite;
    }

    /**
     * The value below which a share {@code p} of the finite values lies, interpolated linearly inside its bin (values
     * taken as spread evenly over a bin); NaN when no finite value was seen.
     */
    public double quantile(double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("a cumulative probability must be in [0, 1], was " + p);
        }
        if (finite == 0) {
            return Double.NaN;
        }
        double target = p * finite;
        long below = 0;
        for (int i = 0; i < counts.length; i++) {
            if (counts[i] > 0 && below + counts[i] >= target) {
                return binLower(i) + width * Math.max(0, target - below) / counts[i];
            }
            below += counts[i];
        }
        return upper();
    }

    /** The value at an exceedance level (P90 = low case = 10th percentile) over the finite values. */
    public double level(ExceedanceLevel level) {
        return quantile(level.cumulativeProbability());
    }

    /** Share of the finite values that exceed the upper edge of bin {@code i}: the exceedance curve at that edge. */
    public double exceedanceAbove(int bin) {
        if (finite == 0) {
            return Double.NaN;
        }
        long upTo = 0;
        for (int i = 0; i <= bin; i++) {
            upTo += counts[i];
        }
        return (finite - upTo) / (double) finite;
    }
}
