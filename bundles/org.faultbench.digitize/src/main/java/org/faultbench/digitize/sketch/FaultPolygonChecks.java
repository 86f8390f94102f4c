package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;

/**
 * Fault polygons that cannot serve as heave zones: outlines left open by more than the closure tolerance, and closed
 * outlines that are not valid polygons by the OGC Simple Features rules (self-intersecting ring, too few distinct
 * points), tested with JTS {@link IsValidOp}.
 */
final class FaultPolygonChecks {

    private FaultPolygonChecks() {
    }

    static List<TopologyProblem> find(List<FaultPolygonFeature> polygons, double closureTolerance) {
        List<TopologyProblem> problems = new ArrayList<>();
        for (FaultPolygonFeature polygon : polygons) {
            if (polygon.closingGap() > closureTolerance) {
                problems.add(open(polygon, closureTolerance));
            } else {
                TopologyValidationError error = new IsValidOp(polygon.heaveZone()).getValidationError();
                if (error != null) {
                    problems.add(invalid(polygon, error));
                }
            }
        }
        return problems;
    }

    private static TopologyProblem open(FaultPolygonFeature polygon, double closureTolerance) {
        Coordinate last = polygon.outline().getEndPoint().getCoordinate();
        return new TopologyProblem(ProblemKind.FAULT_POLYGON_OPEN, List.of(polygon.id()), last.x, last.y,
                polygon.describe() + " is not closed: its last point " + SheetGeometry.position(last) + " is "
                        + SheetGeometry.number(Math.round(polygon.closingGap() * 10) / 10.0)
                        + " m from its first point (closure tolerance " + SheetGeometry.number(closureTolerance)
                        + " m)");
    }

    private static TopologyProblem invalid(FaultPolygonFeature polygon, TopologyValidationError error) {
        Coordinate at = error.getCoordinate();
        return new TopologyProblem(ProblemKind.FAULT_POLYGON_INVALID, List.of(polygon.id()), at.x, at.y,
                polygon.describe() + " is not a valid polygon at " + SheetGeometry.position(at) + ": "
                        + error.getMessage().toLowerCase(Locale.ROOT));
    }
}
