package org.faultbench.core.uncertain;

import org.apache.commons.math3.random.RandomGenerator;

/**
 * An input that is either known (a fixed value) or uncertain (a probability distribution). The same object serves
 * the deterministic case ({@link #nominal()}), Monte Carlo ({@link #sample}) and tornado or Latin-hypercube
 * designs ({@link #quantile}).
 *
 * <p>{@link #nominal()} is the <em>mean</em> of the distribution, or the value itself when fixed. The mean, not the
 * mode, so a deterministic run uses the expected value of every input; for a triangular range that is
 * (min + mode + max) / 3, for a lognormal it is above the median.
 *
 * <p>{@link #sample} turns exactly one uniform draw of the caller's generator into a value by the inverse CDF, so the
 * caller owns the random stream: the same seed gives the same values, and a fixed value consumes its draw too, so
 * changing one input from fixed to uncertain does not shift the draws of the others.
 *
 * <p>Parameters must be finite numbers; only truncation limits may be infinite (meaning "open on that side").
 */
public sealed interface UncertainValue permits FixedValue, NormalValue, UniformValue, TriangularValue, LogNormalValue {

    /** The deterministic value: the mean of the distribution, or the fixed value. */
    double nominal();

    /** Inverse cumulative distribution function: the value not exceeded with probability {@code p} in [0, 1]. */
    double quantile(double p);

    /**
     * Restricts this value to {@code bounds}. Returns this value when it already fits. Distributions with an
     * open-ended tail (normal, lognormal) are truncated to the bounds on that side; a fixed value, a uniform or
     * triangular range, or an explicit truncation limit that leaves the bounds is rejected.
     *
     * @param field what the value describes, used in the error message (e.g. "unit 'Sand A' porosity")
     * @throws IllegalArgumentException if the value cannot respect the bounds
     */
    UncertainValue within(Bounds bounds, String field);

    /** One value drawn by inverse transform of one uniform draw from {@code rng}. */
    default double sample(RandomGenerator rng) {
        double u = rng.nextDouble();
        // nextDouble() is in [0, 1); a draw of exactly 0 (chance 2^-53) would give -infinity for an open lower tail,
        // so it is moved to the next grid value 2^-53.
        return quantile(u > 0 ? u : 0x1.0p-53);
    }

    static UncertainValue fixed(double value) {
        return new FixedValue(value);
    }

    static UncertainValue normal(double mean, double standardDeviation) {
        return new NormalValue(mean, standardDeviation, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    static UncertainValue truncatedNormal(double mean, double standardDeviation, double lower, double upper) {
        return new NormalValue(mean, standardDeviation, lower, upper);
    }

    static UncertainValue uniform(double min, double max) {
        return new UniformValue(min, max);
    }

    static UncertainValue triangular(double min, double mode, double max) {
        return new TriangularValue(min, mode, max);
    }

    /** Lognormal from its median (P50) and the standard deviation of ln(value). */
    static UncertainValue logNormal(double median, double sigmaLn) {
        return LogNormalValue.ofMedian(median, sigmaLn);
    }

    /** Lognormal from its arithmetic mean and standard deviation. */
    static UncertainValue logNormalFromMeanAndSd(double mean, double standardDeviation) {
        return LogNormalValue.ofMeanAndSd(mean, standardDeviation);
    }
}
