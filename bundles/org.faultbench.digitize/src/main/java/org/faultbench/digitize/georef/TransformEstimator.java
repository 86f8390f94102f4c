package org.faultbench.digitize.georef;

import java.util.List;

/**
 * Fits one type of pixel-to-map transform to control points. The built-in kinds have one each; a plug-in adds a type
 * by contributing an estimator to {@value TransformContributions#POINT}.
 */
@FunctionalInterface
public interface TransformEstimator {

    /**
     * Least-squares fit to the enabled points. {@link TransformFitter} has already checked that there are at least the
     * type's minimum number, with unique ids, not all at one place.
     *
     * @throws IllegalArgumentException when the points cannot fix the transform, with a message for the user
     */
    GeoTransform estimate(List<ControlPoint> enabled);
}
