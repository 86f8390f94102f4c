package org.faultbench.digitize.georef;

/**
 * A control point picked by the user: a pixel of the scanned image and the map position it shows. Pixel indices
 * follow the world-file convention, (0, 0) being the centre of the upper-left pixel, rows counting downwards;
 * sub-pixel positions are allowed. Disabled points stay in the list (so the user can switch them back on) but take
 * no part in the fit.
 *
 * @param id label shown to the user, unique within one fit
 * @param col pixel column
 * @param row pixel row, downwards
 * @param x map easting (or x) in map units
 * @param y map northing (or y) in map units, upwards
 * @param enabled whether the point takes part in the fit
 */
public record ControlPoint(String id, double col, double row, double x, double y, boolean enabled) {

    public ControlPoint {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("control point id is empty");
        }
        requireFinite(id, "pixel column", col);
        requireFinite(id, "pixel row", row);
        requireFinite(id, "map x", x);
        requireFinite(id, "map y", y);
    }

    /** An enabled control point. */
    public static ControlPoint of(String id, double col, double row, double x, double y) {
        return new ControlPoint(id, col, row, x, y, true);
    }

    /** The same point switched on or off. */
    public ControlPoint withEnabled(boolean on) {
        return new ControlPoint(id, col, row, x, y, on);
    }

    private static void requireFinite(String id, String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(
                    "control point '" + id + "': " + field + " must be a finite number, was " + value);
        }
    }
}
