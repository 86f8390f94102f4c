package org.faultbench.sim;

import org.apache.commons.math3.stat.descriptive.moment.Mean;
import org.apache.commons.math3.stat.descriptive.rank.PSquarePercentile;

/**
 * Summary statistics of one result quantity over a stream of realisations in constant memory: mean, extremes and the
 * P90/P50/P10 levels (exceedance convention) estimated with the P² algorithm (Jain &amp; Chlamtac 1985) as
 * implemented by commons-math3. Non-finite values (e.g. "no leak point": an infinite leak depth) are counted apart and
 * left out of the statistics, so {@link #finiteFraction()} says how many realisations the percentiles speak for.
 *
 * <p>The P² estimate depends on the order of the values; callers feed realisations in index order so the result is
 * the same whatever the thread count.
 */
public final class StreamingSummary {
    private final PSquarePercentile p90 = new PSquarePercentile(100 * ExceedanceLevel.P90.cumulativeProbability());
    private final PSquarePercentile p50 = new PSquarePercentile(100 * ExceedanceLevel.P50.cumulativeProbability());
    private final PSquarePercentile p10 = new PSquarePercentile(100 * ExceedanceLevel.P10.cumulativeProbability());
    private final Mean mean = new Mean();
    private double min = Double.POSITIVE_INFINITY;
    private double max = Double.NEGATIVE_INFINITY;
    private long count;
    private long nonFinite;

    public void add(double value) {
        count++;
        if (!Double.isFinite(value)) {
            nonFinite++;
            return;
        }
        p90.increment(value);
        p50.increment(value);
        p10.increment(value);
        mean.increment(value);
        min = Math.min(min, value);
        max = Math.max(max, value);
    }

    /** Number of values seen, finite or not. */
    public long count() {
        return count;
    }

    /** Share of the values that were finite; 0 when none were seen. */
    public double finiteFraction() {
        return count == 0 ? 0 : (count - nonFinite) / (double) count;
    }

    /** The value at an exceedance level over the finite values; NaN when there are none. */
    public double level(ExceedanceLevel level) {
        if (count == nonFinite) {
            return Double.NaN;
        }
        switch (level) {
        case P90:
            return p90.getResult();
        case P50:
            return p50.getResult();
        default:
            return p10.getResult();
        }
    }

    public double mean() {
        return count == nonFinite ? Double.NaN : mean.getResult();
    }

    public double min() {
        return count == nonFinite ? Double.NaN : min;
    }

    public double max() {
        return count == nonFinite ? Double.NaN : max;
    }
}
