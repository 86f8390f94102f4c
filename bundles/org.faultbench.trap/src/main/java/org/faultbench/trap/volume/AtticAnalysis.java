package org.faultbench.trap.volume;

import org.faultbench.core.column.ReservoirProperties;
/**
 * Attic oil of a compartment that drains across a fault into a neighbouring block produced by a well.
 * <p>
 * Oil leaves the compartment only through its shallowest reservoir connection across the fault, and the well takes
 * only oil that reaches its drainage depth (top of the perforations, or where it meets the top reservoir). The
 * contact after depletion is therefore the deeper of those two depths, and never deeper than the original contact
 * (nothing drains when both lie below it). The attic is the oil between the crest and that depth (common practice;
 * remaining-oil screening as in Weber &amp; Dronkert 1998, SPE 50669). Faults that sealed over geological time can
 * leak once production lowers the pressure, so the result is a screening estimate.
 */
public final class AtticAnalysis {
    private final Volumetrics volumes;
    private final ReservoirProperties properties;

    /**
     * @param volumes rock of the original accumulation: its mask is the closure at the original contact, so every
     *        part of it above the contact after depletion, including a culmination that then stands apart, is attic
     * @param properties reservoir properties of the compartment
     */
    public AtticAnalysis(Volumetrics volumes, ReservoirProperties properties) {
        if (volumes == null || properties == null) {
            throw new IllegalArgumentException("volumes or reservoir properties missing");
        }
        this.volumes = volumes;
        this.properties = properties;
    }

    /**
     * Depth the contact rises to: the deeper of the connection and drainage depths, capped by the original contact.
     * Use +Infinity for "no connection" or "no drainage", which leaves the original contact.
     */
    public static double contactAfterDepletion(double originalContact, double connectionDepth, double drainageDepth) {
        requireNumber("original contact", originalContact);
        requireDepthOrInfinity("cross-fault connection depth", connectionDepth);
        requireDepthOrInfinity("well drainage depth", drainageDepth);
        return Math.min(originalContact, Math.max(connectionDepth, drainageDepth));
    }

    /**
     * @param crestDepth crest of the compartment, metres positive down
     * @param originalContact original free-water level or oil-water contact, at or below the crest
     * @param connectionDepth shallowest reservoir-reservoir connection to the drained block (+Infinity: none)
     * @param drainageDepth depth down to which the well drains (+Infinity: it does not drain this compartment)
     */
    public AtticResult analyse(double crestDepth, double originalContact, double connectionDepth,
            double drainageDepth) {
        requireNumber("crest depth", crestDepth);
        requireNumber("original contact", originalContact);
        if (originalContact < crestDepth) {
            throw new IllegalArgumentException("original contact (" + originalContact + " m) lies above the crest ("
                    + crestDepth + " m)");
        }
        double contact = contactAfterDepletion(originalContact, connectionDepth, drainageDepth);
        double atticBottom = Math.max(crestDepth, contact);
        double originalRock = volumes.grossRockVolumeBetween(crestDepth, originalContact);
        double atticRock = volumes.grossRockVolumeBetween(crestDepth, atticBottom);
        return new AtticResult(originalContact - crestDepth, contact, atticBottom - crestDepth, originalRock,
                atticRock, properties.stockTankOil(originalRock), properties.stockTankOil(atticRock));
    }

    private static void requireNumber(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number, was " + value);
        }
    }

    private static void requireDepthOrInfinity(String field, double value) {
        if (Double.isNaN(value) || value == Double.NEGATIVE_INFINITY) {
            throw new IllegalArgumentException(field + " must be a number or +Infinity (none), was " + value);
        }
    }
}
