package org.faultbench.digitize.georef;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * A type of georeference transform the fitter can use: a built-in {@link TransformKind} or a contributed one.
 *
 * @param id stable identifier; for the built-ins the lower-case kind name map-sheet files use ("affine")
 * @param name shown to the user, e.g. "affine"
 * @param minimumPoints fewest control points that fix the transform (each point gives two equations)
 * @param estimator the fit
 */
public record TransformType(String id, String name, int minimumPoints, TransformEstimator estimator) {

    public TransformType {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("transform type id is missing");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("transform type '" + id + "' has no name");
        }
        if (minimumPoints < 1) {
            throw new IllegalArgumentException("transform type '" + id + "' needs at least 1 control point, says "
                    + minimumPoints);
        }
        Objects.requireNonNull(estimator, "estimator");
    }

    /** The built-in kind as a type. */
    public static TransformType of(TransformKind kind) {
        TransformEstimator estimator = switch (kind) {
            case SIMILARITY -> new BuiltInTransforms.Similarity();
            case AFFINE -> new BuiltInTransforms.Affine();
            case POLYNOMIAL_2 -> new BuiltInTransforms.Polynomial2();
            case PROJECTIVE -> new BuiltInTransforms.Projective();
        };
        return new TransformType(idOf(kind), kind.label(), kind.minimumPoints(), estimator);
    }

    /** The id of a built-in kind: "similarity", "affine", "polynomial_2", "projective". */
    public static String idOf(TransformKind kind) {
        return kind.name().toLowerCase(Locale.ROOT);
    }

    /** The built-in kind of this type, empty for a contributed type. */
    public Optional<TransformKind> builtInKind() {
        for (TransformKind kind : TransformKind.values()) {
            if (idOf(kind).equals(id)) {
                return Optional.of(kind);
            }
        }
        return Optional.empty();
    }

    /**
     * Whether control points on one straight line leave the transform undetermined. True for every type that needs
     * three or more points (a line of points fixes at most four parameters); the similarity, fixed by two points,
     * is the exception among the built-ins.
     */
    public boolean refusesCollinearPoints() {
        return minimumPoints >= 3;
    }
}
