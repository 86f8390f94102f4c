package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateArrays;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.operation.valid.IsSimpleOp;

/**
 * Contours that meet where they may not: two contours of different depth on one horizon cannot share a point, and a
 * contour cannot cross itself (contouring rules, e.g. Tearpock &amp; Bischke 2003, Applied Subsurface Geological
 * Mapping, 2nd ed., ch. 4). Candidate pairs come from an STR-tree of contour envelopes.
 */
final class ContourCrossings {

    private ContourCrossings() {
    }

    static List<TopologyProblem> find(List<ContourFeature> contours) {
        List<TopologyProblem> problems = new ArrayList<>();
        STRtree index = new STRtree();
        for (int k = 0; k < contours.size(); k++) {
            index.insert(contours.get(k).line().getEnvelopeInternal(), k);
        }
        for (int k = 0; k < contours.size(); k++) {
            ContourFeature contour = contours.get(k);
            selfCrossing(contour, problems);
            for (Object candidate : index.query(contour.line().getEnvelopeInternal())) {
                int other = (Integer) candidate;
                if (other > k) {
                    differentValuesMeeting(contour, contours.get(other), problems);
                }
            }
        }
        return problems;
    }

    /**
     * Repeated vertices (a double-click, a traced line through a node) are not a crossing, but JTS 1.20's
     * IsSimpleOp reports a vertex repeated three times at a bend as non-simple, so they are dropped first.
     */
    private static void selfCrossing(ContourFeature contour, List<TopologyProblem> problems) {
        LineString line = contour.line();
        IsSimpleOp simple = new IsSimpleOp(line.getFactory().createLineString(
                CoordinateArrays.removeRepeatedPoints(line.getCoordinates())));
        if (!simple.isSimple()) {
            Coordinate at = simple.getNonSimpleLocation();
            problems.add(new TopologyProblem(ProblemKind.CONTOUR_CROSSES_ITSELF, List.of(contour.id()), at.x, at.y,
                    contour.describe() + " crosses itself at " + SheetGeometry.position(at)));
        }
    }

    private static void differentValuesMeeting(ContourFeature a, ContourFeature b, List<TopologyProblem> problems) {
        if (!a.horizon().equals(b.horizon()) || a.depth() == b.depth()) {
            return;
        }
        LineString first = a.line();
        if (first.intersects(b.line())) {
            Coordinate at = first.intersection(b.line()).getCoordinate();
            problems.add(new TopologyProblem(ProblemKind.CONTOURS_CROSS, List.of(a.id(), b.id()), at.x, at.y,
                    a.describe() + " and contour " + SheetGeometry.number(b.depth()) + " m meet at "
                            + SheetGeometry.position(at) + "; contours of different depth cannot cross or touch"));
        }
    }
}
