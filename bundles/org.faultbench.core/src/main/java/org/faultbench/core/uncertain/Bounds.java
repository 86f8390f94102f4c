package org.faultbench.core.uncertain;

/**
 * The closed range a physical quantity must respect, such as a thickness that cannot be negative or a fraction that
 * must lie in [0, 1]. Either end may be infinite to leave that side open.
 *
 * @param min lowest allowed value, may be {@link Double#NEGATIVE_INFINITY}
 * @param max highest allowed value, may be {@link Double#POSITIVE_INFINITY}
 */
public record Bounds(double min, double max) {

    /** No restriction. */
    public static final Bounds UNBOUNDED = new Bounds(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    /** Zero or more: thicknesses, densities, pressures. */
    public static final Bounds NON_NEGATIVE = new Bounds(0, Double.POSITIVE_INFINITY);
    /** [0, 1]: clay fraction, net-to-gross, porosity, saturation. */
    public static final Bounds FRACTION = new Bounds(0, 1);

    public Bounds {
        if (Double.isNaN(min) || Double.isNaN(max)) {
            throw new IllegalArgumentException("bounds: min and max must be numbers, were " + min + " and " + max);
        }
        if (min > max) {
            throw new IllegalArgumentException("bounds: min " + min + " is above max " + max);
        }
    }

    /** Values from {@code min} upward. */
    public static Bounds atLeast(double min) {
        return new Bounds(min, Double.POSITIVE_INFINITY);
    }

    public boolean contains(double value) {
        return value >= min && value <= max;
    }

    @Override
    public String toString() {
        String low = min == Double.NEGATIVE_INFINITY ? "(-inf" : "[" + min;
        String high = max == Double.POSITIVE_INFINITY ? "+inf)" : max + "]";
        return low + ", " + high;
    }
}
