package org.faultbench.core.uncertain;

import org.apache.commons.math3.distribution.RealDistribution;

/**
 * Inverse-CDF sampling of a distribution restricted to [lower, upper]: the probability p is mapped onto
 * [F(lower), F(upper)] and inverted, so one uniform draw still gives one value and the tails are cut, not piled up.
 */
final class Truncation {

    /**
     * Smallest share of the probability the limits may keep. Below it the limits almost miss the distribution, which
     * is nearly always a typing slip (a percentage entered for a fraction, a wrong sign).
     */
    static final double MIN_RETAINED_PROBABILITY = 0.01;

    private Truncation() {
    }

    static void requireRetained(RealDistribution distribution, double lower, double upper, String description) {
        double retained = retainedProbability(distribution, lower, upper);
        if (!(retained >= MIN_RETAINED_PROBABILITY)) {
            throw new IllegalArgumentException(description + ": the limits [" + lower + ", " + upper + "] keep only "
                    + retained + " of the probability (at least " + MIN_RETAINED_PROBABILITY
                    + " needed); check the parameters and units");
        }
    }

    static double retainedProbability(RealDistribution distribution, double lower, double upper) {
        return distribution.cumulativeProbability(upper) - distribution.cumulativeProbability(lower);
    }

    /** Quantile {@code p} of {@code distribution} truncated to [lower, upper]; the result never leaves the limits. */
    static double quantile(RealDistribution distribution, double lower, double upper, double p) {
        double low = distribution.cumulativeProbability(lower);
        double high = distribution.cumulativeProbability(upper);
        double value = distribution.inverseCumulativeProbability(low + p * (high - low));
        return Math.min(upper, Math.max(lower, value));
    }
}
