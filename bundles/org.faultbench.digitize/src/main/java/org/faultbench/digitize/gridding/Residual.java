package org.faultbench.digitize.gridding;

/**
 * How far a gridded surface misses one known depth.
 *
 * @param point the checked point
 * @param surfaceZ surface depth read at the point's x, y, metres; NaN where the surface has no value there
 */
public record Residual(LabelledPoint point, double surfaceZ) {

    public Residual {
        if (point == null) {
            throw new IllegalArgumentException("residual needs its checked point");
        }
    }

    /** Surface depth minus known depth, metres: positive where the surface lies too deep; NaN without a value. */
    public double residual() {
        return surfaceZ - point.z();
    }

    /** Whether the surface has a value at the point. */
    public boolean hasValue() {
        return !Double.isNaN(surfaceZ);
    }
}
