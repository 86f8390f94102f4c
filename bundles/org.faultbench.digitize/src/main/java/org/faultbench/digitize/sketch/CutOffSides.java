package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineSegment;
import org.locationtech.jts.linearref.LocationIndexedLine;

/**
 * Cut-offs digitized on the wrong wall. Each cut-off is compared with the nearest trace of its fault: every cut-off
 * point is projected onto the trace (JTS {@link LocationIndexedLine}) and its side of the nearest trace segment is
 * taken from the sign of the orientation determinant (JTS {@link Orientation#index}: counterclockwise = left). A
 * hanging-wall cut-off belongs on the trace's hanging-wall side, a footwall cut-off on the other; the cut-off is
 * reported when more of its points lie on the wrong side than on the right one. Cut-offs whose fault has no trace
 * on the sheet are not checked.
 */
final class CutOffSides {

    private CutOffSides() {
    }

    static List<TopologyProblem> find(List<CutOffFeature> cutOffs, List<FaultTraceFeature> traces) {
        List<TopologyProblem> problems = new ArrayList<>();
        for (CutOffFeature cutOff : cutOffs) {
            nearestTrace(cutOff, traces).flatMap(trace -> wrongWall(cutOff, trace)).ifPresent(problems::add);
        }
        return problems;
    }

    private static Optional<FaultTraceFeature> nearestTrace(CutOffFeature cutOff, List<FaultTraceFeature> traces) {
        return traces.stream().filter(trace -> trace.fault().equals(cutOff.fault()))
                .min(Comparator.comparingDouble(trace -> trace.trace().distance(cutOff.line())));
    }

    private static Optional<TopologyProblem> wrongWall(CutOffFeature cutOff, FaultTraceFeature trace) {
        TraceSide expected = cutOff.wall() == Wall.HANGING_WALL ? trace.hangingWallSide()
                : trace.hangingWallSide().opposite();
        LocationIndexedLine along = new LocationIndexedLine(trace.trace());
        int right = 0;
        int wrong = 0;
        Coordinate firstWrong = null;
        for (Coordinate point : cutOff.line().getCoordinates()) {
            LineSegment segment = along.project(point).getSegment(trace.trace());
            int orientation = Orientation.index(segment.p0, segment.p1, point);
            if (orientation == Orientation.COLLINEAR) {
                continue;
            }
            TraceSide side = orientation == Orientation.COUNTERCLOCKWISE ? TraceSide.LEFT : TraceSide.RIGHT;
            if (side == expected) {
                right++;
            } else {
                wrong++;
                firstWrong = firstWrong == null ? point : firstWrong;
            }
        }
        if (wrong <= right) {
            return Optional.empty();
        }
        String otherWall = cutOff.wall() == Wall.HANGING_WALL ? Wall.FOOTWALL.label() : Wall.HANGING_WALL.label();
        return Optional.of(new TopologyProblem(ProblemKind.CUT_OFF_ON_WRONG_WALL, List.of(cutOff.id(), trace.id()),
                firstWrong.x, firstWrong.y, cutOff.describe() + " lies on the " + otherWall + " side of the fault"
                        + " trace (" + wrong + " of " + (wrong + right) + " points off the trace, first at "
                        + SheetGeometry.position(firstWrong) + "); the hanging wall is " + trace.hangingWallSide()
                                .name().toLowerCase(Locale.ROOT) + " of the trace as digitized"));
    }
}
