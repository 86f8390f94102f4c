package org.faultbench.digitize.ui.editing;

import java.util.OptionalDouble;

import org.faultbench.digitize.georef.ControlPoint;

/**
 * One line of the control-point table: the point and, when it takes part in a fit, its residuals in map units.
 *
 * @param point the control point
 * @param dx map x residual (observed − fitted); empty for a disabled point or without a fit
 * @param dy map y residual
 * @param magnitude length of the residual
 * @param leaveOneOut leave-one-out residual; empty when the other points cannot fix the transform
 * @param worst whether this is the point the fit report names as worst
 */
public record ResidualRow(ControlPoint point, OptionalDouble dx, OptionalDouble dy, OptionalDouble magnitude,
        OptionalDouble leaveOneOut, boolean worst) {
}
