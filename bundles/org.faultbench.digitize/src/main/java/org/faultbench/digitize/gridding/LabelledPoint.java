package org.faultbench.digitize.gridding;

/**
 * A point where a gridded surface is checked against a known depth, named so that the user can find it.
 *
 * @param label e.g. "point 3" or "Well A / Top Sand"
 * @param x map x, metres
 * @param y map y, metres
 * @param z known depth, metres, positive downward
 */
public record LabelledPoint(String label, double x, double y, double z) {

    public LabelledPoint {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("checked point needs a label");
        }
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("checked point '" + label + "': x, y, z must be finite numbers, was ("
                    + x + ", " + y + ", " + z + ")");
        }
    }
}
