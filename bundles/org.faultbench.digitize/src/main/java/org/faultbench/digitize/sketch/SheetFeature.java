package org.faultbench.digitize.sketch;

import org.locationtech.jts.geom.Geometry;

/** One digitized item on a {@link MapSheet}. Implementations are immutable values; an edit replaces the value. */
public sealed interface SheetFeature
        permits ContourFeature, FaultTraceFeature, FaultPolygonFeature, CutOffFeature, MarkerFeature, WellFeature {

    FeatureId id();

    /** Map geometry as digitized, metres: what is drawn and snapped to. Do not modify it. */
    Geometry geometry();

    /** Short description for messages and undo labels, e.g. "contour 1500 m on Top A". */
    String describe();
}
