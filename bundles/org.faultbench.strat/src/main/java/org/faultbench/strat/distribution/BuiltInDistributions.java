package org.faultbench.strat.distribution;

import java.util.List;
import java.util.Map;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.faultbench.core.uncertain.UncertainValue;

/**
 * Parameterisations in the vocabulary of volumetrics: exceedance P90 and P10 (P90 = low case = 10th percentile) and
 * minimum / most likely / maximum. Classes the extension registry can create, named in this bundle's plugin.xml.
 */
public final class BuiltInDistributions {

    /** z of the 90th percentile of the standard normal, about 1.28155 (computed, not typed). */
    static final double Z90 = new NormalDistribution().inverseCumulativeProbability(0.9);

    private BuiltInDistributions() {
    }

    /** Lognormal through P90 (low) and P10 (high): median √(P90·P10), σ_ln = ln(P10/P90) / (2·z₀.₉). */
    public static final class P90P10LogNormal implements DistributionFactory {
        @Override
        public UncertainValue create(Map<String, Double> p) {
            double low = p.get("p90");
            double high = p.get("p10");
            if (!(low > 0 && high > low)) {
                throw new IllegalArgumentException("p10 must exceed p90 and both must be positive (P90 = low case), "
                        + "were p90 " + low + ", p10 " + high);
            }
            return UncertainValue.logNormal(Math.sqrt(low * high), Math.log(high / low) / (2 * Z90));
        }
    }

    /** Normal through P90 (low) and P10 (high): mean (P90 + P10) / 2, sd (P10 − P90) / (2·z₀.₉). */
    public static final class P90P10Normal implements DistributionFactory {
        @Override
        public UncertainValue create(Map<String, Double> p) {
            double low = p.get("p90");
            double high = p.get("p10");
            if (!(high > low)) {
                throw new IllegalArgumentException("p10 must exceed p90 (P90 = low case), were p90 " + low + ", p10 "
                        + high);
            }
            return UncertainValue.normal((low + high) / 2, (high - low) / (2 * Z90));
        }
    }

    /** Triangular from minimum, most likely and maximum. */
    public static final class MinMostLikelyMax implements DistributionFactory {
        @Override
        public UncertainValue create(Map<String, Double> p) {
            return UncertainValue.triangular(p.get("min"), p.get("mostLikely"), p.get("max"));
        }
    }

    /** The built-ins as plugin.xml declares them. */
    static final List<DistributionType> TYPES = List.of(
            new DistributionType("p90p10Lognormal", "Lognormal from P90 and P10", List.of("p90", "p10"),
                    new P90P10LogNormal()),
            new DistributionType("p90p10Normal", "Normal from P90 and P10", List.of("p90", "p10"), new P90P10Normal()),
            new DistributionType("minMostLikelyMax", "Triangular from minimum, most likely and maximum",
                    List.of("min", "mostLikely", "max"), new MinMostLikelyMax()));

    public static List<DistributionType> types() {
        return TYPES;
    }
}
