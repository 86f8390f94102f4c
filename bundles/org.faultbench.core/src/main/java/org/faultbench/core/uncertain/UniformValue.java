package org.faultbench.core.uncertain;

import org.apache.commons.math3.distribution.UniformRealDistribution;

/** Every value in [min, max] equally likely: a range with no preferred value. Nominal is the midpoint (the mean). */
public record UniformValue(double min, double max) implements UncertainValue {

    public UniformValue {
        Checks.requireFinite(min, "uniform min");
        Checks.requireFinite(max, "uniform max");
        Checks.requireBelow(min, max, "uniform min", "max");
    }

    @Override
    public double nominal() {
        return (min + max) / 2;
    }

    @Override
    public double quantile(double p) {
        Checks.requireProbability(p);
        return new UniformRealDistribution(null, min, max).inverseCumulativeProbability(p);
    }

    @Override
    public UncertainValue within(Bounds bounds, String field) {
        if (!bounds.contains(min) || !bounds.contains(max)) {
            throw Checks.outsideBounds(field, "uniform range [" + min + ", " + max + "]", bounds);
        }
        return this;
    }
}
