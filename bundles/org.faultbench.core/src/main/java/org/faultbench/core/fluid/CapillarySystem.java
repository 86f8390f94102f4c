package org.faultbench.core.fluid;

/**
 * A pair of immiscible fluids in a rock, reduced to what scales its capillary pressures: interfacial tension times
 * the cosine of the contact angle (Washburn / Purcell). The magnitude of the cosine is used, so an angle may be quoted
 * through either phase as the trade does: 140 degrees for mercury measured through the mercury is the same as 40
 * degrees through the air.
 *
 * @param name label, e.g. "mercury-air"
 * @param interfacialTension N/m, &gt; 0
 * @param contactAngle degrees, in [0, 180], not 90 (no capillary pressure at 90 degrees)
 */
public record CapillarySystem(String name, double interfacialTension, double contactAngle) {

    /**
     * Mercury-air of mercury-injection laboratory data: 480 mN/m, 140 degrees (Purcell 1949; Schowalter 1979, values
     * from memory).
     */
    public static final CapillarySystem MERCURY_AIR = new CapillarySystem("mercury-air", 0.480, 140);

    public CapillarySystem {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("capillary system name is empty");
        }
        if (!(interfacialTension > 0) || Double.isInfinite(interfacialTension)) {
            throw new IllegalArgumentException("capillary system '" + name
                    + "': interfacial tension must be a finite number > 0 N/m, was " + interfacialTension);
        }
        if (!(contactAngle >= 0 && contactAngle <= 180) || contactAngle == 90) {
            throw new IllegalArgumentException("capillary system '" + name
                    + "': contact angle must be in [0, 180] degrees and not 90, was " + contactAngle);
        }
    }

    /** The system "fluid against brine" of a hydrocarbon or CO2. */
    public static CapillarySystem againstBrine(Fluid fluid) {
        if (fluid.kind() == FluidKind.WATER) {
            throw new IllegalArgumentException("fluid '" + fluid.name()
                    + "' is water: brine against brine has no capillary interface");
        }
        return new CapillarySystem(fluid.name() + "-brine", fluid.interfacialTension(), fluid.contactAngle());
    }

    /** gamma |cos theta|, N/m: capillary pressures of one pore system scale with it. */
    public double wettingTerm() {
        return interfacialTension * Math.abs(Math.cos(Math.toRadians(contactAngle)));
    }
}
