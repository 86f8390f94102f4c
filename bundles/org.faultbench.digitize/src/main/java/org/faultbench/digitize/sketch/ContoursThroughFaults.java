package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.IntersectionMatrix;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Contours that run on through a fault instead of ending at it. Common practice (e.g. Tearpock &amp; Bischke 2003,
 * Applied Subsurface Geological Mapping, 2nd ed., fault-map chapters): a contour stops at the fault trace or at the
 * edge of the fault polygon, because the horizon is offset there. A contour whose end lies on a trace or on a polygon
 * edge is fine; one whose interior meets a trace's interior, or enters a polygon of its own horizon, is flagged as a
 * warning. Polygons that are not valid are skipped (reported by {@link FaultPolygonChecks}).
 */
final class ContoursThroughFaults {

    private ContoursThroughFaults() {
    }

    static List<TopologyProblem> find(List<ContourFeature> contours, List<FaultTraceFeature> traces,
            List<FaultPolygonFeature> polygons) {
        STRtree traceIndex = new STRtree();
        for (FaultTraceFeature trace : traces) {
            traceIndex.insert(trace.trace().getEnvelopeInternal(), trace);
        }
        List<TopologyProblem> problems = new ArrayList<>();
        for (ContourFeature contour : contours) {
            for (Object candidate : traceIndex.query(contour.line().getEnvelopeInternal())) {
                throughTrace(contour, (FaultTraceFeature) candidate, problems);
            }
            for (FaultPolygonFeature polygon : polygons) {
                if (polygon.horizon().equals(contour.horizon())) {
                    intoPolygon(contour, polygon, problems);
                }
            }
        }
        return problems;
    }

    private static void throughTrace(ContourFeature contour, FaultTraceFeature trace,
            List<TopologyProblem> problems) {
        LineString line = contour.line();
        if (line.relate(trace.trace()).get(Location.INTERIOR, Location.INTERIOR) < 0) {
            return;
        }
        Coordinate at = firstInteriorPoint(line.intersection(trace.trace()), line);
        problems.add(warning(contour, trace, at, "runs through " + trace.describe()));
    }

    private static void intoPolygon(ContourFeature contour, FaultPolygonFeature feature,
            List<TopologyProblem> problems) {
        Polygon zone = feature.heaveZone();
        if (!zone.getEnvelopeInternal().intersects(contour.line().getEnvelopeInternal()) || !zone.isValid()) {
            return;
        }
        IntersectionMatrix relation = zone.relate(contour.line());
        if (relation.get(Location.INTERIOR, Location.INTERIOR) < 0) {
            return;
        }
        Coordinate at = contour.line().intersection(zone).getCoordinate();
        problems.add(warning(contour, feature, at, "enters " + feature.describe()));
    }

    /** A point where the contour meets the fault other than at the contour's own ends. */
    private static Coordinate firstInteriorPoint(Geometry meeting, LineString contour) {
        for (Coordinate c : meeting.getCoordinates()) {
            if (!c.equals2D(contour.getCoordinateN(0)) && !c.equals2D(contour.getCoordinateN(
                    contour.getNumPoints() - 1))) {
                return c;
            }
        }
        return meeting.getCoordinate();
    }

    private static TopologyProblem warning(ContourFeature contour, SheetFeature fault, Coordinate at, String what) {
        return new TopologyProblem(ProblemKind.CONTOUR_CROSSES_FAULT, List.of(contour.id(), fault.id()), at.x, at.y,
                contour.describe() + " " + what + " at " + SheetGeometry.position(at)
                        + "; contours should end at the fault trace or fault polygon edge");
    }
}
