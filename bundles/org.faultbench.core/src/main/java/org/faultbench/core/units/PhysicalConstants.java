package org.faultbench.core.units;

/** Gravity values used for buoyancy and hydrostatic pressure. */
public final class PhysicalConstants {

    /** Acceleration due to gravity used throughout Faultbench, m/s^2: the rounded value of common practice. */
    public static final double G = 9.81;

    /** Standard acceleration of gravity, m/s^2 (exact by definition, 3rd CGPM 1901), for those who need it. */
    public static final double STANDARD_GRAVITY = 9.80665;

    private PhysicalConstants() {
    }
}
