package org.faultbench.digitize.sketch;

import java.math.BigDecimal;

/**
 * Proposes the value of the next contour while digitizing a contour map: the last value plus or minus the contour
 * interval (1500, 1510, 1520, ...). The step is done in decimal arithmetic so that an interval such as 0.1 m gives
 * 1500.1, 1500.2, 1500.3 as typed, without binary round-off creeping into the labels.
 */
public final class ContourValueStepper {
    private final BigDecimal interval;

    /** @param interval contour interval, metres, a finite number &gt; 0 */
    public ContourValueStepper(double interval) {
        if (!(interval > 0) || Double.isInfinite(interval)) {
            throw new IllegalArgumentException("contour interval must be a finite number > 0 m, was " + interval);
        }
        this.interval = BigDecimal.valueOf(interval);
    }

    public double interval() {
        return interval.doubleValue();
    }

    /** The contour value one interval deeper or shallower than {@code last}, metres. */
    public double next(double last, StepDirection direction) {
        if (!Double.isFinite(last)) {
            throw new IllegalArgumentException("last contour value must be a finite number, was " + last);
        }
        SheetGeometry.required(direction, "contour step direction");
        BigDecimal from = BigDecimal.valueOf(last);
        return (direction == StepDirection.DEEPER ? from.add(interval) : from.subtract(interval)).doubleValue();
    }
}
