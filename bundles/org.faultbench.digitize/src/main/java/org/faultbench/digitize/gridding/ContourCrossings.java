package org.faultbench.digitize.gridding;

import java.util.List;

import org.locationtech.jts.algorithm.RobustLineIntersector;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Refuses contours of different depth that cross or touch: the surface would need two depths at one place.
 * <p>
 * Why an index: comparing every pair of contours costs n&sup2; line intersections, seconds for the 100,000-vertex
 * maps of the performance target. Here every contour segment sits in an STR-tree (JTS), and each segment is tested
 * only against the segments whose envelopes overlap its own, so the check costs about n log n. The pair reported is
 * the same as the pairwise scan would report: the one with the lowest first and then second contour number.
 */
final class ContourCrossings {

    private ContourCrossings() {
    }

    /** @throws IllegalArgumentException naming the first pair of contours of different depth that meet, and where */
    static void requireNone(List<ContourLine> contours) {
        STRtree segments = new STRtree();
        for (int c = 0; c < contours.size(); c++) {
            Coordinate[] points = contours.get(c).line().getCoordinates();
            for (int k = 0; k + 1 < points.length; k++) {
                segments.insert(new Envelope(points[k], points[k + 1]), new IndexedSegment(c, points[k], points[k + 1]));
            }
        }
        long first = Long.MAX_VALUE;
        RobustLineIntersector intersector = new RobustLineIntersector();
        for (int a = 0; a < contours.size(); a++) {
            Coordinate[] points = contours.get(a).line().getCoordinates();
            double depth = contours.get(a).z();
            for (int k = 0; k + 1 < points.length; k++) {
                for (Object item : segments.query(new Envelope(points[k], points[k + 1]))) {
                    IndexedSegment other = (IndexedSegment) item;
                    int b = other.contour();
                    if (b <= a || contours.get(b).z() == depth || pairKey(a, b, contours.size()) >= first) {
                        continue;
                    }
                    intersector.computeIntersection(points[k], points[k + 1], other.p0(), other.p1());
                    if (intersector.hasIntersection()) {
                        first = pairKey(a, b, contours.size());
                    }
                }
            }
        }
        if (first != Long.MAX_VALUE) {
            int a = (int) (first / contours.size());
            int b = (int) (first % contours.size());
            LineString one = contours.get(a).line();
            Coordinate at = one.intersection(contours.get(b).line()).getCoordinate();
            throw new IllegalArgumentException("contours " + (a + 1) + " (" + contours.get(a).z() + " m) and " + (b + 1)
                    + " (" + contours.get(b).z() + " m) cross near (" + at.x + ", " + at.y
                    + "); contours of different depth may not meet");
        }
    }

    private static long pairKey(int a, int b, int count) {
        return (long) a * count + b;
    }

    /** One segment of contour number {@code contour} (0-based). */
    private record IndexedSegment(int contour, Coordinate p0, Coordinate p1) {
    }
}
