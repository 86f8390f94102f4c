package org.faultbench.digitize.sketch;

import java.util.List;

import org.faultbench.digitize.io.WellTop;
import org.locationtech.jts.geom.Point;

/**
 * A well posted on the map at its surface (or reference) location, with its formation tops; each top keeps its own
 * x, y so that deviated wells pick horizons away from the posted location.
 *
 * @param id identity on the sheet
 * @param name well name; every top must carry it
 * @param x map x of the posted location, metres
 * @param y map y of the posted location, metres
 * @param tops formation tops (copied)
 */
public record WellFeature(FeatureId id, String name, double x, double y, List<WellTop> tops)
        implements SheetFeature {

    public WellFeature {
        SheetGeometry.required(id, "well id");
        name = SheetGeometry.name(name, "well name");
        SheetGeometry.point(x, y, "well " + name);
        tops = List.copyOf(SheetGeometry.required(tops, "well " + name + ": tops list (may be empty)"));
        for (WellTop top : tops) {
            if (!top.well().strip().equals(name)) {
                throw new IllegalArgumentException("well " + name + ": top '" + top.surface()
                        + "' belongs to well '" + top.well() + "'");
            }
        }
    }

    /** The tops picked on {@code horizon}. */
    public List<WellTop> topsOn(String horizon) {
        return tops.stream().filter(top -> top.surface().strip().equals(horizon)).toList();
    }

    @Override
    public Point geometry() {
        return SheetGeometry.point(x, y, describe());
    }

    @Override
    public String describe() {
        return "well " + name;
    }
}
