package org.faultbench.core.fluid;

/**
 * Converts a capillary (threshold) pressure measured or calibrated in one fluid system to another in the same pore
 * system: P2 = P1 (gamma2 cos theta2) / (gamma1 cos theta1) (Purcell 1949; Schowalter 1979). Used to turn
 * mercury-air laboratory data or oil-brine calibrations into gas-brine or CO2-brine threshold pressures.
 */
public record CapillaryScaling(CapillarySystem from, CapillarySystem to) {

    public CapillaryScaling {
        if (from == null || to == null) {
            throw new IllegalArgumentException("capillary scaling needs both fluid systems, was " + from + " -> " + to);
        }
    }

    /** The factor P2 / P1. */
    public double factor() {
        return to.wettingTerm() / from.wettingTerm();
    }

    /** {@code pressure} (Pa) of the source system expressed in the target system. */
    public double convert(double pressure) {
        if (!(pressure >= 0)) {
            throw new IllegalArgumentException("capillary pressure must be >= 0 Pa, was " + pressure);
        }
        return pressure * factor();
    }
}
