package org.faultbench.core.uncertain;

import org.apache.commons.math3.distribution.LogNormalDistribution;

/**
 * Lognormal distribution (ln of the value is normal with mean ln(median) and standard deviation sigmaLn), for
 * multiplicative, right-skewed quantities: permeability, capillary pressure, volumes. Optionally truncated to
 * [lower, upper]; lower = 0 and upper = +infinity mean "not truncated". Nominal is the mean of the (truncated)
 * distribution, which for the untruncated case is median * exp(sigmaLn^2 / 2), above the median.
 *
 * @param median median (P50), &gt; 0
 * @param sigmaLn standard deviation of ln(value), &gt; 0
 * @param lower lower truncation limit, &ge; 0
 * @param upper upper truncation limit, may be {@link Double#POSITIVE_INFINITY}
 */
public record LogNormalValue(double median, double sigmaLn, double lower, double upper) implements UncertainValue {

    /** Relative accuracy of the numerical inverse CDF, as a fraction of the median. */
    private static final double RELATIVE_INVERSE_ACCURACY = 1e-12;

    public LogNormalValue {
        Checks.requirePositive(median, "lognormal median");
        Checks.requirePositive(sigmaLn, "lognormal sigmaLn");
        Checks.requireFinite(lower, "lognormal lower limit");
        if (lower < 0) {
            throw new IllegalArgumentException("lognormal lower limit must be >= 0, was " + lower);
        }
        Checks.requireLimit(upper, "lognormal upper limit");
        Checks.requireBelow(lower, upper, "lognormal lower limit", "upper limit");
        Truncation.requireRetained(distribution(median, sigmaLn), lower, upper,
                "lognormal(median " + median + ", sigmaLn " + sigmaLn + ")");
    }

    /** Untruncated lognormal from its median (P50) and the standard deviation of ln(value). */
    public static LogNormalValue ofMedian(double median, double sigmaLn) {
        return new LogNormalValue(median, sigmaLn, 0, Double.POSITIVE_INFINITY);
    }

    /**
     * Untruncated lognormal from its arithmetic mean and standard deviation:
     * sigmaLn^2 = ln(1 + (sd/mean)^2), median = mean / sqrt(1 + (sd/mean)^2).
     */
    public static LogNormalValue ofMeanAndSd(double mean, double standardDeviation) {
        Checks.requirePositive(mean, "lognormal mean");
        Checks.requirePositive(standardDeviation, "lognormal standard deviation");
        double spread = 1 + (standardDeviation / mean) * (standardDeviation / mean);
        return ofMedian(mean / Math.sqrt(spread), Math.sqrt(Math.log(spread)));
    }

    public boolean isTruncated() {
        return lower > 0 || upper < Double.POSITIVE_INFINITY;
    }

    /**
     * Mean; when truncated, E[X] (G(upper) - G(lower)) / (F(upper) - F(lower)), where F is this lognormal's CDF and G
     * the CDF of the lognormal with log-mean shifted by sigmaLn^2 (partial expectation of the lognormal).
     */
    @Override
    public double nominal() {
        double untruncatedMean = median * Math.exp(sigmaLn * sigmaLn / 2);
        if (!isTruncated()) {
            return untruncatedMean;
        }
        LogNormalDistribution shifted = new LogNormalDistribution(null, Math.log(median) + sigmaLn * sigmaLn, sigmaLn);
        return untruncatedMean * Truncation.retainedProbability(shifted, lower, upper)
                / Truncation.retainedProbability(distribution(median, sigmaLn), lower, upper);
    }

    @Override
    public double quantile(double p) {
        Checks.requireProbability(p);
        LogNormalDistribution distribution = distribution(median, sigmaLn);
        if (!isTruncated()) {
            return distribution.inverseCumulativeProbability(p);
        }
        return Truncation.quantile(distribution, lower, upper, p);
    }

    /**
     * The open upper tail, and the lower tail running down to 0, are cut at the bounds; an explicit limit outside the
     * bounds is rejected.
     */
    @Override
    public UncertainValue within(Bounds bounds, String field) {
        double newLower = lower;
        if (lower < bounds.min()) {
            if (lower > 0) {
                throw Checks.outsideBounds(field, "lognormal lower limit " + lower, bounds);
            }
            newLower = bounds.min();
        }
        double newUpper = upper;
        if (upper == Double.POSITIVE_INFINITY) {
            newUpper = bounds.max();
        } else if (upper > bounds.max()) {
            throw Checks.outsideBounds(field, "lognormal upper limit " + upper, bounds);
        }
        if (newLower == lower && newUpper == upper) {
            return this;
        }
        double cutLower = newLower;
        double cutUpper = newUpper;
        return Checks.labelled(field, () -> new LogNormalValue(median, sigmaLn, cutLower, cutUpper));
    }

    private static LogNormalDistribution distribution(double median, double sigmaLn) {
        return new LogNormalDistribution(null, Math.log(median), sigmaLn, median * RELATIVE_INVERSE_ACCURACY);
    }
}
