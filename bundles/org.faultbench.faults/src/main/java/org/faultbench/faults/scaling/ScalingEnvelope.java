package org.faultbench.faults.scaling;

/**
 * The band of D/L ratios within which faults of a population usually fall. A mapped fault far outside it was
 * probably mis-measured: tips not resolved or several segments joined shorten or lengthen L, drag left out lowers D
 * (Kim &amp; Sanderson 2005, Earth-Sci. Rev. 68).
 *
 * @param minRatio lowest usual D/L
 * @param maxRatio highest usual D/L
 * @param source citation of the band
 */
public record ScalingEnvelope(double minRatio, double maxRatio, String source) {

    /** Normal-fault populations span roughly D/L = 0.001 to 0.1 (Cowie &amp; Scholz 1992; Schultz et al. 2008). */
    public static final ScalingEnvelope NORMAL_FAULTS = new ScalingEnvelope(1e-3, 1e-1,
            "Cowie & Scholz 1992, J. Struct. Geol. 14; Schultz et al. 2008, J. Struct. Geol. 30 (from memory)");

    public ScalingEnvelope {
        if (!(minRatio > 0 && maxRatio > minRatio) || Double.isInfinite(maxRatio)) {
            throw new IllegalArgumentException("D/L envelope: need 0 < minimum < maximum ratio, was " + minRatio
                    + " to " + maxRatio);
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("D/L envelope: source is empty");
        }
    }

    /** Whether displacement {@code displacement} on a fault of length {@code length} lies inside the band. */
    public boolean contains(double displacement, double length) {
        double ratio = displacement / length;
        return ratio >= minRatio && ratio <= maxRatio;
    }

    /** The band's lower edge as a line D = minRatio · L. */
    public ScalingLaw lower() {
        return new ScalingLaw("Envelope lower edge, D/L = " + minRatio, minRatio, 1, source);
    }

    /** The band's upper edge as a line D = maxRatio · L. */
    public ScalingLaw upper() {
        return new ScalingLaw("Envelope upper edge, D/L = " + maxRatio, maxRatio, 1, source);
    }
}
