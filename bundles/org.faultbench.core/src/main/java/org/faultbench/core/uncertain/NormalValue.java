package org.faultbench.core.uncertain;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Normal (Gaussian) distribution, optionally truncated to [lower, upper]; infinite limits mean "not truncated on that
 * side". Truncation renormalises the density inside the limits (inverse CDF on [F(lower), F(upper)]), so samples and
 * quantiles never leave them. Nominal is the mean of the truncated distribution (the plain mean when untruncated).
 *
 * @param mean mean of the untruncated distribution
 * @param standardDeviation standard deviation of the untruncated distribution, &gt; 0
 * @param lower lower truncation limit, or {@link Double#NEGATIVE_INFINITY}
 * @param upper upper truncation limit, or {@link Double#POSITIVE_INFINITY}
 */
public record NormalValue(double mean, double standardDeviation, double lower, double upper) implements UncertainValue {

    private static final NormalDistribution STANDARD = new NormalDistribution(null, 0, 1);

    public NormalValue {
        Checks.requireFinite(mean, "normal mean");
        Checks.requirePositive(standardDeviation, "normal standard deviation");
        Checks.requireLimit(lower, "normal lower limit");
        Checks.requireLimit(upper, "normal upper limit");
        Checks.requireBelow(lower, upper, "normal lower limit", "upper limit");
        Truncation.requireRetained(distribution(mean, standardDeviation), lower, upper,
                "normal(mean " + mean + ", sd " + standardDeviation + ")");
    }

    public boolean isTruncated() {
        return lower > Double.NEGATIVE_INFINITY || upper < Double.POSITIVE_INFINITY;
    }

    /** Mean; when truncated, mu + sigma (phi(alpha) - phi(beta)) / (Phi(beta) - Phi(alpha)). */
    @Override
    public double nominal() {
        if (!isTruncated()) {
            return mean;
        }
        double alpha = (lower - mean) / standardDeviation;
        double beta = (upper - mean) / standardDeviation;
        double retained = STANDARD.cumulativeProbability(beta) - STANDARD.cumulativeProbability(alpha);
        return mean + standardDeviation * (STANDARD.density(alpha) - STANDARD.density(beta)) / retained;
    }

    @Override
    public double quantile(double p) {
        Checks.requireProbability(p);
        NormalDistribution distribution = distribution(mean, standardDeviation);
        if (!isTruncated()) {
            return distribution.inverseCumulativeProbability(p);
        }
        return Truncation.quantile(distribution, lower, upper, p);
    }

    /** Open tails are cut at the bounds; a finite limit outside the bounds is rejected. */
    @Override
    public UncertainValue within(Bounds bounds, String field) {
        double newLower = lower;
        if (lower == Double.NEGATIVE_INFINITY) {
            newLower = bounds.min();
        } else if (lower < bounds.min()) {
            throw Checks.outsideBounds(field, "normal lower limit " + lower, bounds);
        }
        double newUpper = upper;
        if (upper == Double.POSITIVE_INFINITY) {
            newUpper = bounds.max();
        } else if (upper > bounds.max()) {
            throw Checks.outsideBounds(field, "normal upper limit " + upper, bounds);
        }
        if (newLower == lower && newUpper == upper) {
            return this;
        }
        double cutLower = newLower;
        double cutUpper = newUpper;
        return Checks.labelled(field, () -> new NormalValue(mean, standardDeviation, cutLower, cutUpper));
    }

    private static NormalDistribution distribution(double mean, double standardDeviation) {
        return new NormalDistribution(null, mean, standardDeviation);
    }
}
