package org.faultbench.digitize.sketch;

import org.faultbench.digitize.gridding.FootwallSide;
import org.locationtech.jts.geom.LineString;

/**
 * A digitized fault trace: where the fault cuts the mapped horizon(s). The side towards which the fault dips (the
 * hanging wall) is recorded, because cut-off lines are checked against it.
 *
 * @param id identity on the sheet
 * @param fault fault name, shared with its polygons and cut-offs
 * @param trace the trace in map metres (copied)
 * @param hangingWallSide side of the trace, looking along its digitizing direction, that holds the hanging wall
 */
public record FaultTraceFeature(FeatureId id, String fault, LineString trace, TraceSide hangingWallSide)
        implements SheetFeature {

    public FaultTraceFeature {
        SheetGeometry.required(id, "fault trace id");
        fault = SheetGeometry.name(fault, "fault trace: fault name");
        trace = SheetGeometry.line(trace, "fault trace of " + fault);
        SheetGeometry.required(hangingWallSide, "fault trace of " + fault + ": hanging-wall side");
    }

    /** The footwall side in the form the cut-off extractor of the gridding package takes. */
    public FootwallSide footwallSide() {
        return hangingWallSide == TraceSide.LEFT ? FootwallSide.RIGHT : FootwallSide.LEFT;
    }

    @Override
    public LineString geometry() {
        return trace;
    }

    @Override
    public String describe() {
        return "fault trace of " + fault;
    }
}
