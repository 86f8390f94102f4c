package org.faultbench.sim;

import java.util.EnumMap;
import java.util.Map;

/**
 * Chooses each histogram's starting range before a run, from the base case of the study, so the bins are as fine as
 * the structure allows: depths over the unit's crest-to-spill range, columns over 0 to its structural relief, volumes
 * over 0 to twice the base-case volume. Values that fall outside widen the range ({@link AdaptiveHistogram}).
 */
final class HistogramBins {
    /** Relief assumed when the structure has no finite spill point (closed on every side by faults), m. */
    private static final double OPEN_RELIEF = 500;
    /** Starting range of a volume whose base case is zero or undefined, m³. */
    private static final double DEFAULT_VOLUME = 1e6;

    private HistogramBins() {
    }

    /** One empty histogram per quantity for the reservoir unit in {@code slot} of the base case. */
    static Map<UnitQuantity, AdaptiveHistogram> forUnit(RealisationOutcome baseCase, int slot, int bins) {
        double crest = baseCase.get(slot, UnitQuantity.CREST);
        double spill = baseCase.get(slot, UnitQuantity.SPILL_DEPTH);
        double relief = Double.isFinite(spill) && Double.isFinite(crest) && spill > crest ? spill - crest : OPEN_RELIEF;
        Map<UnitQuantity, AdaptiveHistogram> histograms = new EnumMap<>(UnitQuantity.class);
        for (UnitQuantity q : UnitQuantity.values()) {
            double base = baseCase.get(slot, q);
            double lo;
            double hi;
            switch (q) {
            case COLUMN, ATTIC_COLUMN -> {
                lo = 0;
                hi = relief;
            }
            case STOIIP, ATTIC_STOIIP -> {
                lo = 0;
                hi = Double.isFinite(base) && base > 0 ? 2 * base : DEFAULT_VOLUME;
            }
            default -> {
                double top = Double.isFinite(crest) ? crest : base;
                lo = minFinite(top, base);
                hi = maxFinite(top + relief, base);
            }
            }
            histograms.put(q, AdaptiveHistogram.over(lo, hi, bins));
        }
        return histograms;
    }

    private static double minFinite(double a, double b) {
        return !Double.isFinite(a) ? b : !Double.isFinite(b) ? a : Math.min(a, b);
    }

    private static double maxFinite(double a, double b) {
        return !Double.isFinite(a) ? b : !Double.isFinite(b) ? a : Math.max(a, b);
    }
}
