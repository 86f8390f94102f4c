package org.faultbench.digitize.georef;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * How far one enabled control point is from the fitted transform, as observed minus fitted.
 *
 * @param point the control point
 * @param dx map x of the point minus the transform's map x of its pixel, map units
 * @param dy map y of the point minus the transform's map y of its pixel, map units
 * @param dCol pixel column of the point minus the transform's column of its map position, pixels
 * @param dRow pixel row of the point minus the transform's row of its map position, pixels
 * @param leaveOneOut distance (map units) between the point's map position and its prediction by the transform
 *        refitted without it; empty when the other points alone cannot fix the transform. A misplaced point pulls
 *        the fit towards itself, hiding part of its error in its plain residual but not in this one.
 */
public record PointResidual(ControlPoint point, double dx, double dy, double dCol, double dRow,
        OptionalDouble leaveOneOut) {

    public PointResidual {
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(leaveOneOut, "leaveOneOut");
    }

    /** Length of the residual, map units. */
    public double magnitude() {
        return Math.hypot(dx, dy);
    }

    /** Length of the residual, pixels. */
    public double pixelMagnitude() {
        return Math.hypot(dCol, dRow);
    }
}
