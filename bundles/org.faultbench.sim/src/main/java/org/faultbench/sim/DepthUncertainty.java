package org.faultbench.sim;

import org.faultbench.core.uncertain.UncertainValue;

/**
 * Depth error of the mapped reference horizon: a common shift of the whole surface plus a smooth correlated
 * residual ({@link CorrelatedResidualField}). Both move the horizon grid and the fault cut-offs together.
 *
 * @param shift common depth shift, m (positive = deeper)
 * @param residualStandardDeviation standard deviation of the residual surface, m (0 = none)
 * @param correlationLength lateral correlation length of the residual, m
 */
public record DepthUncertainty(UncertainValue shift, double residualStandardDeviation, double correlationLength) {

    public static final DepthUncertainty NONE = new DepthUncertainty(UncertainValue.fixed(0), 0, 1000);

    public DepthUncertainty {
        if (shift == null) {
            throw new IllegalArgumentException("depth uncertainty: shift is missing");
        }
        if (!(residualStandardDeviation >= 0) || Double.isInfinite(residualStandardDeviation)) {
            throw new IllegalArgumentException("depth uncertainty: residual standard deviation must be a finite number"
                    + " >= 0 m, was " + residualStandardDeviation);
        }
        if (!(correlationLength > 0) || Double.isInfinite(correlationLength)) {
            throw new IllegalArgumentException("depth uncertainty: correlation length must be a finite number > 0 m,"
                    + " was " + correlationLength);
        }
    }

    public boolean hasResidual() {
        return residualStandardDeviation > 0;
    }
}
