package org.faultbench.digitize.sketch;

import java.util.Collection;
import java.util.Optional;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineSegment;
import org.locationtech.jts.geom.LineString;

/**
 * Snaps a clicked map point onto existing features so that contours end exactly on faults, polygons close and
 * cut-offs join their trace: to the nearest vertex within the vertex tolerance, otherwise to the nearest point on a
 * segment within the segment tolerance, otherwise not at all. Vertices win over segments so that lines share their
 * corners rather than creating near-duplicate ones.
 */
public final class Snapper {
    private final double vertexTolerance;
    private final double segmentTolerance;

    /**
     * @param vertexTolerance snapping distance to vertices, map metres, &ge; 0 (0 switches vertex snapping off)
     * @param segmentTolerance snapping distance to segments, map metres, &ge; 0 (0 switches segment snapping off)
     */
    public Snapper(double vertexTolerance, double segmentTolerance) {
        this.vertexTolerance = requireTolerance("vertex snapping tolerance", vertexTolerance);
        this.segmentTolerance = requireTolerance("segment snapping tolerance", segmentTolerance);
    }

    private static double requireTolerance(String field, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number >= 0 m, was " + value);
        }
        return value;
    }

    /** Snaps (x, y) onto {@code candidates}, e.g. the features of a sheet other than the one being drawn. */
    public SnapResult snap(Collection<? extends SheetFeature> candidates, double x, double y) {
        SheetGeometry.required(candidates, "features to snap to");
        Coordinate clicked = new Coordinate(x, y);
        Nearest vertex = new Nearest(clicked, vertexTolerance);
        Nearest segment = new Nearest(clicked, segmentTolerance);
        for (SheetFeature feature : candidates) {
            Geometry geometry = feature.geometry();
            if (vertex.mayReach(geometry)) {
                for (Coordinate c : geometry.getCoordinates()) {
                    vertex.offer(c, feature.id());
                }
            }
            if (segment.mayReach(geometry) && geometry instanceof LineString line) {
                offerSegments(line, feature.id(), segment);
            }
        }
        Nearest chosen = vertex.found() ? vertex : segment;
        if (!chosen.found()) {
            return new SnapResult(SnapKind.NONE, x, y, Optional.empty());
        }
        return new SnapResult(chosen == vertex ? SnapKind.VERTEX : SnapKind.SEGMENT, chosen.point.x, chosen.point.y,
                Optional.of(chosen.feature));
    }

    private static void offerSegments(LineString line, FeatureId id, Nearest nearest) {
        Coordinate[] points = line.getCoordinates();
        for (int k = 0; k + 1 < points.length; k++) {
            nearest.offer(new LineSegment(points[k], points[k + 1]).closestPoint(nearest.clicked), id);
        }
    }

    /** The closest offered point within a tolerance. */
    private static final class Nearest {
        private final Coordinate clicked;
        private final double tolerance;
        private Coordinate point;
        private FeatureId feature;
        private double distance;

        Nearest(Coordinate clicked, double tolerance) {
            this.clicked = clicked;
            this.tolerance = tolerance;
            this.distance = tolerance;
        }

        boolean mayReach(Geometry geometry) {
            Envelope box = new Envelope(geometry.getEnvelopeInternal());
            box.expandBy(tolerance);
            return tolerance > 0 && box.covers(clicked);
        }

        void offer(Coordinate candidate, FeatureId id) {
            double d = candidate.distance(clicked);
            if (d < distance || (point == null && d <= tolerance)) {
                point = candidate;
                feature = id;
                distance = d;
            }
        }

        boolean found() {
            return point != null;
        }
    }
}
