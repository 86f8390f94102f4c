package org.faultbench.digitize.georef;

import java.util.List;

/**
 * The built-in estimators as classes the extension registry can create, named in this bundle's plugin.xml so the
 * {@value TransformContributions#POINT} point lists the built-ins in the product like any contribution.
 */
public final class BuiltInTransforms {

    private BuiltInTransforms() {
    }

    /** Helmert similarity, 2 points. */
    public static final class Similarity implements TransformEstimator {
        @Override
        public GeoTransform estimate(List<ControlPoint> enabled) {
            return SimilarityEstimator.estimate(enabled);
        }
    }

    /** Affine, 3 points. */
    public static final class Affine implements TransformEstimator {
        @Override
        public GeoTransform estimate(List<ControlPoint> enabled) {
            return AffineEstimator.estimate(enabled);
        }
    }

    /** Second-order polynomial, 6 points. */
    public static final class Polynomial2 implements TransformEstimator {
        @Override
        public GeoTransform estimate(List<ControlPoint> enabled) {
            return Polynomial2Estimator.estimate(enabled);
        }
    }

    /** Projective (homography), 4 points. */
    public static final class Projective implements TransformEstimator {
        @Override
        public GeoTransform estimate(List<ControlPoint> enabled) {
            return ProjectiveEstimator.estimate(enabled);
        }
    }

    /** The estimator class of a built-in kind. */
    public static Class<? extends TransformEstimator> estimatorClass(TransformKind kind) {
        return switch (kind) {
            case SIMILARITY -> Similarity.class;
            case AFFINE -> Affine.class;
            case POLYNOMIAL_2 -> Polynomial2.class;
            case PROJECTIVE -> Projective.class;
        };
    }
}
