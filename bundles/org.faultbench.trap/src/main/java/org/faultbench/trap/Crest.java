package org.faultbench.trap;

/**
 * The shallowest node of a compartment, where a hydrocarbon column starts.
 *
 * @param i grid column
 * @param j grid row
 * @param x map x, metres
 * @param y map y, metres
 * @param z depth of the top reservoir, metres TVDSS, positive down
 */
public record Crest(int i, int j, double x, double y, double z) {

    public Crest {
        if (i < 0 || j < 0) {
            throw new IllegalArgumentException("crest node indices must be >= 0, was (" + i + ", " + j + ")");
        }
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("crest x, y and depth must be finite numbers, was (" + x + ", " + y
                    + ", " + z + ")");
        }
    }
}
