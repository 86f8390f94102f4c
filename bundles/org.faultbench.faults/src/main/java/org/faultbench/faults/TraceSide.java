package org.faultbench.faults;

import org.locationtech.jts.algorithm.Distance;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineSegment;

/**
 * Which side of a polyline a map point lies on, judged at the nearest point of the line. Where that nearest point is
 * a bend, one segment alone can give the wrong answer on sharp bends, so the side is taken from both segments and
 * the direction of the turn.
 */
final class TraceSide {

    private TraceSide() {
    }

    /**
     * @return {@link Orientation#LEFT}, {@link Orientation#RIGHT} or {@link Orientation#COLLINEAR} (on the line or on
     *     the prolongation of an end segment) for a walk from the first to the last vertex
     */
    static int of(Coordinate[] line, Coordinate point) {
        int nearest = nearestSegment(line, point);
        double along = new LineSegment(line[nearest], line[nearest + 1]).projectionFactor(point);
        int vertex = along <= 0 ? nearest : along >= 1 ? nearest + 1 : -1;
        if (vertex > 0 && vertex < line.length - 1) {
            return atBend(line[vertex - 1], line[vertex], line[vertex + 1], point);
        }
        return Orientation.index(line[nearest], line[nearest + 1], point);
    }

    private static int nearestSegment(Coordinate[] line, Coordinate point) {
        int nearest = 0;
        double nearestDistance = Double.POSITIVE_INFINITY;
        for (int i = 0; i < line.length - 1; i++) {
            double distance = Distance.pointToSegment(point, line[i], line[i + 1]);
            if (distance < nearestDistance) {
                nearestDistance = distance;
                nearest = i;
            }
        }
        return nearest;
    }

    /** Inside a left turn a point is left of both segments; outside it, right of either (mirror for right turns). */
    private static int atBend(Coordinate before, Coordinate bend, Coordinate after, Coordinate point) {
        int first = Orientation.index(before, bend, point);
        int second = Orientation.index(bend, after, point);
        int turn = Orientation.index(before, bend, after);
        if (turn == Orientation.COLLINEAR || first == second) {
            return first;
        }
        int outer = -turn;
        return first == outer || second == outer ? outer : turn;
    }
}
