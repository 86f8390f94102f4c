package org.faultbench.core.uncertain;

/** A known value: every quantile, sample and the nominal case return it. */
public record FixedValue(double value) implements UncertainValue {

    public FixedValue {
        Checks.requireFinite(value, "fixed value");
    }

    @Override
    public double nominal() {
        return value;
    }

    @Override
    public double quantile(double p) {
        Checks.requireProbability(p);
        return value;
    }

    @Override
    public UncertainValue within(Bounds bounds, String field) {
        if (!bounds.contains(value)) {
            throw Checks.outsideBounds(field, "value " + value, bounds);
        }
        return this;
    }
}
