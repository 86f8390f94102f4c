package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.faultbench.faults.Fault;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;

/**
 * Intersections between fault traces. A fault that abuts another is truncated there, which explains throw that does
 * not die out at that end.
 */
public final class FaultIntersections {

    private FaultIntersections() {
    }

    /** Every point where another trace crosses or touches {@code fault}'s trace, ordered along strike. */
    public static List<FaultIntersection> along(Fault fault, List<Fault> others) {
        List<FaultIntersection> result = new ArrayList<>();
        for (Fault other : others) {
            if (other.id().equals(fault.id())) {
                continue;
            }
            Geometry meeting = fault.trace().intersection(other.trace());
            for (Coordinate point : meeting.getCoordinates()) {
                result.add(new FaultIntersection(other.id(), fault.project(point.x, point.y), point));
            }
        }
        result.sort(Comparator.comparingDouble(FaultIntersection::u));
        return result;
    }

    /** The other fault whose trace passes nearest to {@code point}, if it is within {@code distance}. */
    public static Optional<Fault> nearestWithin(Coordinate point, List<Fault> others, double distance) {
        Point where = new GeometryFactory().createPoint(point);
        return others.stream()
                .filter(other -> other.trace().isWithinDistance(where, distance))
                .min(Comparator.comparingDouble(other -> other.trace().distance(where)));
    }
}
