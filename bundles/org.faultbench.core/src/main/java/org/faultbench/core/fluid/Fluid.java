package org.faultbench.core.fluid;

/**
 * A reservoir fluid at reservoir conditions, described by what capillary sealing needs: density for buoyancy, and
 * interfacial tension and contact angle against brine for converting threshold pressures between fluid systems.
 *
 * <p>The presets are typical starting values of common practice (from memory), not data: replace them with
 * PVT and laboratory values with the {@code with...} methods.
 *
 * @param name label shown to the user
 * @param kind oil, gas, CO2 or water
 * @param density density at reservoir conditions, kg/m3, &gt; 0
 * @param interfacialTension interfacial tension against brine, N/m, &ge; 0 (not used for brine itself)
 * @param contactAngle contact angle against brine measured through the brine, degrees, in [0, 90): capillary
 *        sealing needs a brine-wet rock (not used for brine itself)
 */
public record Fluid(String name, FluidKind kind, double density, double interfacialTension, double contactAngle) {

    /** Oil: 750 kg/m3, 30 mN/m, 0 degrees (typical; oil-brine tension is 5-35 mN/m, Schowalter 1979, from memory). */
    public static final Fluid TYPICAL_OIL = new Fluid("oil", FluidKind.OIL, 750, 0.030, 0);
    /** Gas: 200 kg/m3, 50 mN/m, 0 degrees (typical; gas-brine tension is 30-70 mN/m, Schowalter 1979, from memory). */
    public static final Fluid TYPICAL_GAS = new Fluid("gas", FluidKind.GAS, 200, 0.050, 0);
    /**
     * Supercritical CO2: 700 kg/m3, 30 mN/m, 30 degrees (typical of 1-3 km; both tension and wettability depend on
     * depth and minerals and clays may be less water-wet, so calibrate locally; from memory).
     */
    public static final Fluid TYPICAL_CO2 = new Fluid("CO2", FluidKind.CO2, 700, 0.030, 30);
    /** Formation brine: 1050 kg/m3 (about 10.3 kPa/m; common practice). */
    public static final Fluid TYPICAL_BRINE = new Fluid("brine", FluidKind.WATER, 1050, 0, 0);

    public Fluid {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("fluid name is empty");
        }
        if (kind == null) {
            throw new IllegalArgumentException("fluid '" + name + "': kind is missing");
        }
        if (!(density > 0) || Double.isInfinite(density)) {
            throw new IllegalArgumentException("fluid '" + name + "': density must be a finite number > 0 kg/m3, was "
                    + density);
        }
        if (!(interfacialTension >= 0) || Double.isInfinite(interfacialTension)) {
            throw new IllegalArgumentException("fluid '" + name
                    + "': interfacial tension must be a finite number >= 0 N/m, was " + interfacialTension);
        }
        if (!(contactAngle >= 0 && contactAngle < 90)) {
            throw new IllegalArgumentException("fluid '" + name + "': contact angle must be in [0, 90) degrees "
                    + "(a capillary seal needs a brine-wet rock), was " + contactAngle);
        }
    }

    public Fluid withDensity(double newDensity) {
        return new Fluid(name, kind, newDensity, interfacialTension, contactAngle);
    }

    public Fluid withInterfacialTension(double newInterfacialTension) {
        return new Fluid(name, kind, density, newInterfacialTension, contactAngle);
    }

    public Fluid withContactAngle(double newContactAngle) {
        return new Fluid(name, kind, density, interfacialTension, newContactAngle);
    }
}
