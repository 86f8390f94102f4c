package org.faultbench.digitize.georef;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * A fitted transform with the residuals of its enabled control points, the figures a user checks before trusting a
 * georeferenced scan.
 *
 * @param transform the fitted transform
 * @param residuals one per enabled control point, in input order
 * @param type the type the transform was fitted as (its name and minimum number of points go into the warnings)
 */
public record FitReport(GeoTransform transform, List<PointResidual> residuals, TransformType type) {

    /** A point is suspect when its residual is more than this many times the RMS (common practice). */
    public static final double OUTLIER_FACTOR = 3;

    public FitReport {
        Objects.requireNonNull(transform, "transform");
        residuals = List.copyOf(residuals);
        if (residuals.isEmpty()) {
            throw new IllegalArgumentException("a fit report needs at least one control point residual");
        }
        Objects.requireNonNull(type, "type");
    }

    /** A report on a transform of a built-in kind. */
    public FitReport(GeoTransform transform, List<PointResidual> residuals) {
        this(transform, residuals, TransformType.of(Objects.requireNonNull(transform, "transform").kind()));
    }

    /** Root-mean-square residual √(Σ(dx² + dy²) / N) in map units. */
    public double rms() {
        return Math.sqrt(residuals.stream()
                .mapToDouble(r -> r.dx() * r.dx() + r.dy() * r.dy()).average().orElseThrow());
    }

    /** Root-mean-square residual √(Σ(dCol² + dRow²) / N) in pixels. */
    public double rmsPixels() {
        return Math.sqrt(residuals.stream()
                .mapToDouble(r -> r.dCol() * r.dCol() + r.dRow() * r.dRow()).average().orElseThrow());
    }

    /** Whether every point has a leave-one-out residual (more points than the minimum, none of them essential). */
    public boolean hasLeaveOneOut() {
        return residuals.stream().allMatch(r -> r.leaveOneOut().isPresent());
    }

    /** The point with the largest leave-one-out residual, or the largest plain residual when those are missing. */
    public PointResidual worstPoint() {
        return residuals.stream().max(Comparator.comparingDouble(this::diagnosticResidual)).orElseThrow();
    }

    /**
     * What the user should look at, worded for the user: the fit is exact (no redundancy, so errors cannot show),
     * the RMS exceeds the tolerance, or a point's residual is more than 3 × the RMS and above the tolerance
     * (possible typing error). The point test uses the leave-one-out residual when available: a plain residual can
     * never exceed √N × RMS, so with fewer than 10 points it could never pass 3 × RMS.
     *
     * @param rmsTolerance largest acceptable RMS in map units, e.g. a fraction of the line width or contour interval
     */
    public List<String> warnings(double rmsTolerance) {
        if (!(rmsTolerance >= 0) || Double.isInfinite(rmsTolerance)) {
            throw new IllegalArgumentException("RMS tolerance must be a finite number >= 0, was " + rmsTolerance);
        }
        List<String> warnings = new ArrayList<>();
        if (residuals.size() == type.minimumPoints()) {
            warnings.add(residuals.size() + " control points is the minimum for " + FitErrors.named(type)
                    + ": the fit is exact and cannot reveal a misplaced point; add control points");
        }
        double rms = rms();
        if (rms > rmsTolerance) {
            warnings.add(String.format(Locale.ROOT, "RMS error %.4g map units exceeds the tolerance %.4g; check the"
                    + " control points or choose a more flexible transform", rms, rmsTolerance));
        }
        String residualName = hasLeaveOneOut() ? "leave-one-out residual" : "residual";
        for (PointResidual r : residuals) {
            double residual = diagnosticResidual(r);
            if (residual > OUTLIER_FACTOR * rms && residual > rmsTolerance) {
                warnings.add(String.format(Locale.ROOT, "control point '%s': %s %.4g map units is more than %.0f × the"
                        + " RMS %.4g; possible typing error in its coordinates", r.point().id(), residualName, residual,
                        OUTLIER_FACTOR, rms));
            }
        }
        return warnings;
    }

    private double diagnosticResidual(PointResidual r) {
        return hasLeaveOneOut() ? r.leaveOneOut().getAsDouble() : r.magnitude();
    }
}
