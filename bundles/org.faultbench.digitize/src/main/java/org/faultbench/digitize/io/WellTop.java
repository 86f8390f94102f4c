package org.faultbench.digitize.io;

/**
 * One formation top picked in a well: where the well meets a surface.
 *
 * @param well well name
 * @param surface surface (horizon) name
 * @param x map x of the pick, metres
 * @param y map y of the pick, metres
 * @param tvdss true vertical depth below the datum, metres, positive downward
 * @param md measured depth along hole, metres, NaN when not given
 */
public record WellTop(String well, String surface, double x, double y, double tvdss, double md) {

    public WellTop {
        if (well == null || well.isBlank()) {
            throw new IllegalArgumentException("well top: well name is empty");
        }
        if (surface == null || surface.isBlank()) {
            throw new IllegalArgumentException("well top in '" + well + "': surface name is empty");
        }
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(tvdss)) {
            throw new IllegalArgumentException("well top '" + surface + "' in '" + well
                    + "': x, y and TVDSS must be finite numbers, was (" + x + ", " + y + ", " + tvdss + ")");
        }
        if (Double.isInfinite(md)) {
            throw new IllegalArgumentException("well top '" + surface + "' in '" + well
                    + "': MD must be a finite number or NaN, was " + md);
        }
    }
}
