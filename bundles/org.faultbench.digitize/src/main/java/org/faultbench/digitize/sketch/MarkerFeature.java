package org.faultbench.digitize.sketch;

import org.locationtech.jts.geom.Point;

/**
 * A crest, spill-point or leak-point marker placed on a horizon map.
 *
 * @param id identity on the sheet
 * @param kind what the marker stands for
 * @param x map x, metres
 * @param y map y, metres
 * @param horizon horizon name
 * @param note free text, "" for none
 */
public record MarkerFeature(FeatureId id, MarkerKind kind, double x, double y, String horizon, String note)
        implements SheetFeature {

    public MarkerFeature {
        SheetGeometry.required(id, "marker id");
        SheetGeometry.required(kind, "marker kind");
        horizon = SheetGeometry.name(horizon, kind.label() + " marker: horizon name");
        SheetGeometry.point(x, y, kind.label() + " marker on " + horizon);
        note = SheetGeometry.required(note, kind.label() + " marker note (use \"\" for none)").strip();
    }

    @Override
    public Point geometry() {
        return SheetGeometry.point(x, y, describe());
    }

    @Override
    public String describe() {
        return kind.label() + " on " + horizon;
    }
}
