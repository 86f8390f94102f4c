package org.faultbench.core.uncertain;

import org.apache.commons.math3.distribution.TriangularDistribution;

/**
 * An expert's minimum, most likely and maximum. Nominal is the mean (min + mode + max) / 3, not the mode.
 */
public record TriangularValue(double min, double mode, double max) implements UncertainValue {

    public TriangularValue {
        Checks.requireFinite(min, "triangular min");
        Checks.requireFinite(mode, "triangular mode");
        Checks.requireFinite(max, "triangular max");
        Checks.requireBelow(min, max, "triangular min", "max");
        if (mode < min || mode > max) {
            throw new IllegalArgumentException("triangular mode " + mode + " must lie in [min " + min + ", max "
                    + max + "]");
        }
    }

    @Override
    public double nominal() {
        return (min + mode + max) / 3;
    }

    @Override
    public double quantile(double p) {
        Checks.requireProbability(p);
        return new TriangularDistribution(null, min, mode, max).inverseCumulativeProbability(p);
    }

    @Override
    public UncertainValue within(Bounds bounds, String field) {
        if (!bounds.contains(min) || !bounds.contains(max)) {
            throw Checks.outsideBounds(field, "triangular range [" + min + ", " + max + "]", bounds);
        }
        return this;
    }
}
