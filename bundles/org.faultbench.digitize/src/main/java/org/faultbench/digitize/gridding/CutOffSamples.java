package org.faultbench.digitize.gridding;

/**
 * A horizon's footwall and hanging-wall cut-off depths sampled along a fault trace, as plain arrays so that the
 * fault model can build its cut-off lines and throw profile from them (throw = hanging wall minus footwall depth).
 *
 * @param u distance along the trace from its first point, metres, increasing
 * @param zFootwall horizon depth beside the trace on the footwall side, metres; NaN where the grid has none
 * @param zHangingWall the same on the hanging-wall side
 */
public record CutOffSamples(double[] u, double[] zFootwall, double[] zHangingWall) {

    public CutOffSamples {
        if (u == null || zFootwall == null || zHangingWall == null) {
            throw new IllegalArgumentException("cut-off samples need u, footwall and hanging-wall arrays");
        }
        if (zFootwall.length != u.length || zHangingWall.length != u.length) {
            throw new IllegalArgumentException("cut-off arrays differ in length: u " + u.length + ", footwall "
                    + zFootwall.length + ", hanging wall " + zHangingWall.length);
        }
        u = u.clone();
        zFootwall = zFootwall.clone();
        zHangingWall = zHangingWall.clone();
    }

    @Override
    public double[] u() {
        return u.clone();
    }

    @Override
    public double[] zFootwall() {
        return zFootwall.clone();
    }

    @Override
    public double[] zHangingWall() {
        return zHangingWall.clone();
    }

    /** Number of stations. */
    public int size() {
        return u.length;
    }
}
