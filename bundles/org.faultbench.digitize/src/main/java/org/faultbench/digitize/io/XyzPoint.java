package org.faultbench.digitize.io;

/**
 * One scattered point read from an XYZ file, in metres.
 *
 * @param x map x
 * @param y map y
 * @param z depth or other value, sign as in the file
 */
public record XyzPoint(double x, double y, double z) {

    public XyzPoint {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("point x, y, z must be finite numbers, was (" + x + ", " + y + ", " + z
                    + ")");
        }
    }
}
