package org.faultbench.digitize.georef;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Fits a pixel-to-map transform to control points by least squares (sum of squared map residuals) and reports
 * per-point and leave-one-out residuals.
 */
public final class TransformFitter {

    private TransformFitter() {
    }

    /**
     * Fits the transform to the enabled points.
     *
     * @throws IllegalArgumentException if ids repeat, if fewer points are enabled than the kind needs, or if their
     *         layout cannot fix it (e.g. all on one line)
     */
    public static FitReport fit(TransformKind kind, List<ControlPoint> points) {
        Objects.requireNonNull(kind, "kind");
        return fit(TransformType.of(kind), points);
    }

    /**
     * Fits a transform of any type, built-in ({@link TransformType#of}) or contributed
     * ({@link TransformCatalog#find}), to the enabled points.
     *
     * @throws IllegalArgumentException as {@link #fit(TransformKind, List)}, or when the type's estimator refuses the
     *         points
     */
    public static FitReport fit(TransformType type, List<ControlPoint> points) {
        Objects.requireNonNull(type, "type");
        List<ControlPoint> enabled = enabledWithUniqueIds(points);
        GeoTransform transform = estimate(type, enabled);
        boolean leaveOneOut = enabled.size() > type.minimumPoints();
        List<PointResidual> residuals = new ArrayList<>();
        for (ControlPoint point : enabled) {
            OptionalDouble loo = leaveOneOut ? leaveOneOutResidual(type, enabled, point) : OptionalDouble.empty();
            residuals.add(residual(transform, point, loo));
        }
        return new FitReport(transform, residuals, type);
    }

    private static List<ControlPoint> enabledWithUniqueIds(List<ControlPoint> points) {
        Objects.requireNonNull(points, "points");
        Set<String> ids = new HashSet<>();
        for (ControlPoint point : points) {
            if (!ids.add(Objects.requireNonNull(point, "control point").id())) {
                throw new IllegalArgumentException("control point id '" + point.id() + "' is used more than once");
            }
        }
        return points.stream().filter(ControlPoint::enabled).toList();
    }

    private static GeoTransform estimate(TransformType type, List<ControlPoint> enabled) {
        ControlPointLayout.check(type, enabled);
        GeoTransform transform = type.estimator().estimate(enabled);
        if (transform == null) {
            throw new IllegalArgumentException("the " + type.name() + " transform (" + type.id()
                    + ") returned no fit");
        }
        return transform;
    }

    /** Refits without the point and measures how far the refit misses it; empty if the others cannot fix a fit. */
    private static OptionalDouble leaveOneOutResidual(TransformType kind, List<ControlPoint> enabled,
            ControlPoint left) {
        List<ControlPoint> others = enabled.stream().filter(p -> p != left).toList();
        try {
            double[] predicted = estimate(kind, others).toMap(left.col(), left.row());
            return OptionalDouble.of(Math.hypot(left.x() - predicted[0], left.y() - predicted[1]));
        } catch (IllegalArgumentException degenerate) {
            return OptionalDouble.empty();
        }
    }

    private static PointResidual residual(GeoTransform transform, ControlPoint point, OptionalDouble leaveOneOut) {
        double[] map = transform.toMap(point.col(), point.row());
        double[] pixel = transform.toPixel(point.x(), point.y());
        return new PointResidual(point, point.x() - map[0], point.y() - map[1], point.col() - pixel[0],
                point.row() - pixel[1], leaveOneOut);
    }
}
