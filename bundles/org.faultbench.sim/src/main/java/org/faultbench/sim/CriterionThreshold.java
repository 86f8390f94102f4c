package org.faultbench.sim;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.seal.FaultPointContext;
import org.faultbench.seal.SealCriterion;

/** Any seal criterion, evaluated at every point it is moved to; its bounds are the exact value. */
final class CriterionThreshold implements PointThreshold {
    private final SealSetup seal;
    private SealCriterion criterion;
    private ResolvedColumn column;
    private double pressure;

    CriterionThreshold(SealSetup seal) {
        this.seal = seal;
        this.criterion = seal.criterion();
    }

    @Override
    public void useCriterion(SealCriterion realisationCriterion) {
        this.criterion = realisationCriterion;
    }

    @Override
    public void useColumn(ResolvedColumn column) {
        this.column = column;
    }

    @Override
    public void moveTo(double depth, double faultThrow, double position) {
        pressure = at(depth, faultThrow, position);
    }

    /** The criterion's threshold pressure at a point of the column. */
    double at(double depth, double faultThrow, double position) {
        return criterion.evaluate(new FaultPointContext(depth, faultThrow, position, column, seal.burialDepth()))
                .thresholdPressure();
    }

    @Override
    public double lowerBound() {
        return pressure;
    }

    @Override
    public double upperBound() {
        return pressure;
    }

    @Override
    public double exact() {
        return pressure;
    }

    /** Zero: a threshold pressure is never negative. */
    @Override
    public double lowerBoundAlong(double faultThrow, double firstPosition, double lastPosition, int topUnit,
            int baseUnit) {
        return 0;
    }
}
