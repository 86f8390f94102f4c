package org.faultbench.strat.lithology;

import org.faultbench.core.uncertain.UncertainValue;

/** A default range of a fraction (Vcl, porosity) a new unit of a lithology starts from; the user refines it. */
public record FractionRange(double min, double max) {

    public FractionRange {
        if (!(min >= 0 && min <= max && max <= 1)) {
            throw new IllegalArgumentException("a fraction range needs 0 <= min <= max <= 1, was " + min + " to " + max);
        }
    }

    /** The range as an input: uniform between the limits, or fixed when they coincide. */
    public UncertainValue asUncertainValue() {
        return min == max ? UncertainValue.fixed(min) : UncertainValue.uniform(min, max);
    }
}
