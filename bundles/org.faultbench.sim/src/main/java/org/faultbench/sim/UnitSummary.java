package org.faultbench.sim;

import java.util.EnumMap;
import java.util.Map;

import org.faultbench.trap.Mechanism;

/**
 * Monte Carlo statistics of one reservoir unit, plus its base case (every input at its median).
 *
 * @param unitName the reservoir unit
 * @param statistics streaming statistics per quantity (P90/P50/P10 in the exceedance convention)
 * @param mechanismFractions share of realisations controlled by each mechanism
 * @param baseCase the base-case values per quantity
 * @param baseMechanism what controls the base case
 * @param baseLeakLocation where the base case's leak point is; null when no fault point limits it
 * @param histograms histogram per quantity over the realisations (empty when the summary was built without them)
 */
public record UnitSummary(String unitName, Map<UnitQuantity, StreamingSummary> statistics,
        Map<Mechanism, Double> mechanismFractions, Map<UnitQuantity, Double> baseCase, Mechanism baseMechanism,
        LeakLocation baseLeakLocation, Map<UnitQuantity, AdaptiveHistogram> histograms) {

    /** A summary without histograms (results read back from a file, tests). */
    public UnitSummary(String unitName, Map<UnitQuantity, StreamingSummary> statistics,
            Map<Mechanism, Double> mechanismFractions, Map<UnitQuantity, Double> baseCase, Mechanism baseMechanism,
            LeakLocation baseLeakLocation) {
        this(unitName, statistics, mechanismFractions, baseCase, baseMechanism, baseLeakLocation, Map.of());
    }

    /** The histogram of {@code quantity} over the realisations; null when this summary has none. */
    public AdaptiveHistogram histogram(UnitQuantity quantity) {
        return histograms.get(quantity);
    }

    public StreamingSummary statistics(UnitQuantity quantity) {
        return statistics.get(quantity);
    }

    static Map<UnitQuantity, Double> baseCaseOf(RealisationOutcome outcome, int slot) {
        Map<UnitQuantity, Double> values = new EnumMap<>(UnitQuantity.class);
        for (UnitQuantity q : UnitQuantity.values()) {
            values.put(q, outcome.get(slot, q));
        }
        return values;
    }
}
