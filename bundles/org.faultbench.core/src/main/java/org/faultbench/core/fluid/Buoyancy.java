package org.faultbench.core.fluid;

import org.faultbench.core.units.PhysicalConstants;

/**
 * Buoyancy of a continuous column of a light fluid in water: the pressure excess at the top of a column of height h
 * above the free-water level is (rhoW - rhoHc) g h. The same relation turns a seal's threshold pressure into the
 * column height it supports.
 *
 * @param waterDensity formation water density, kg/m3
 * @param buoyantDensity density of the hydrocarbon or CO2, kg/m3, below the water density
 * @param gravity acceleration due to gravity, m/s^2
 */
public record Buoyancy(double waterDensity, double buoyantDensity, double gravity) {

    public Buoyancy {
        requirePositive(waterDensity, "water density");
        requirePositive(buoyantDensity, "buoyant fluid density");
        requirePositive(gravity, "gravity");
        if (buoyantDensity >= waterDensity) {
            throw new IllegalArgumentException("buoyant fluid density " + buoyantDensity
                    + " kg/m3 must be below the water density " + waterDensity + " kg/m3 to form a buoyant column");
        }
    }

    /** Buoyancy of {@code buoyant} in {@code water} with g = {@link PhysicalConstants#G}. */
    public static Buoyancy of(Fluid buoyant, Fluid water) {
        return new Buoyancy(water.density(), buoyant.density(), PhysicalConstants.G);
    }

    /** Density contrast rhoW - rhoHc, kg/m3. */
    public double densityContrast() {
        return waterDensity - buoyantDensity;
    }

    /** Buoyancy pressure, Pa, at the top of a column of {@code height} metres. */
    public double pressure(double height) {
        if (!(height >= 0)) {
            throw new IllegalArgumentException("column height must be >= 0 m, was " + height);
        }
        return densityContrast() * gravity * height;
    }

    /** Column height, m, whose buoyancy equals {@code pressure} Pa (a seal's threshold pressure). */
    public double columnHeight(double pressure) {
        if (!(pressure >= 0)) {
            throw new IllegalArgumentException("pressure must be >= 0 Pa, was " + pressure);
        }
        return pressure / (densityContrast() * gravity);
    }

    private static void requirePositive(double value, String field) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number > 0, was " + value);
        }
    }
}
