package org.faultbench.digitize.sketch;

import java.util.ArrayList;
import java.util.List;

/**
 * Checks a digitized sheet before it is gridded or used for juxtaposition: crossing or touching contours of
 * different depth, self-crossing contours, open or invalid fault polygons, cut-offs on the wrong wall of their fault
 * (errors) and contours that run through faults (warnings). Each problem names its features and where it is.
 */
public final class TopologyChecker {
    private final double closureTolerance;

    /** @param closureTolerance largest gap, map metres, between a fault polygon's first and last point, &ge; 0 */
    public TopologyChecker(double closureTolerance) {
        if (!(closureTolerance >= 0) || Double.isInfinite(closureTolerance)) {
            throw new IllegalArgumentException("fault polygon closure tolerance must be a finite number >= 0 m, was "
                    + closureTolerance);
        }
        this.closureTolerance = closureTolerance;
    }

    /** All problems on {@code sheet}: errors and warnings, grouped by check. */
    public List<TopologyProblem> check(MapSheet sheet) {
        SheetGeometry.required(sheet, "map sheet");
        List<ContourFeature> contours = sheet.features(ContourFeature.class);
        List<FaultTraceFeature> traces = sheet.features(FaultTraceFeature.class);
        List<FaultPolygonFeature> polygons = sheet.features(FaultPolygonFeature.class);
        List<TopologyProblem> problems = new ArrayList<>(ContourCrossings.find(contours));
        problems.addAll(FaultPolygonChecks.find(polygons, closureTolerance));
        problems.addAll(CutOffSides.find(sheet.features(CutOffFeature.class), traces));
        problems.addAll(ContoursThroughFaults.find(contours, traces, polygons));
        return problems;
    }
}
