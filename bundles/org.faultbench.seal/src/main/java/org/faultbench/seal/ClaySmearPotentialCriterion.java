package org.faultbench.seal;

/**
 * Clay smear potential (Bouvier et al. 1989; Fulljames, Zijerveld &amp; Franssen 1997): shear smears thin away from
 * their source bed, CSP = sum over shale source beds of t^2 / d, where t is the bed thickness and d the distance
 * along the fault from the point to the bed's nearer cut-off (see {@link ThrowWindow#distanceFromCutOff}). Shale
 * source beds are the units of lithology class SEAL that have slipped past the point. CSP is +infinity where the point
 * faces a source bed.
 *
 * <p>Assumptions to keep in mind when calibrating: each bed contributes from its nearer cut-off only (not the sum of
 * footwall and hanging-wall smears), and distances are vertical, so CSP is that of a vertical projection of the
 * fault (along dip, d is longer by 1 / sin(dip)).
 *
 * <p>Threshold, a simple binary rule: seals (+infinity) where CSP &ge; the minimum sealing CSP, leaks (0 Pa) below.
 * CSP thresholds are basin-specific and there is no published default: the no-argument criterion is uncalibrated,
 * with minimum sealing CSP = +infinity, so it reports CSP but gives no seal credit.
 */
public final class ClaySmearPotentialCriterion extends ClayBasedCriterion {

    public static final String ID = "csp";

    private final double minimumSealingCsp;

    /** Uncalibrated: CSP is reported, the fault rock gets no seal credit. */
    public ClaySmearPotentialCriterion() {
        this(Double.POSITIVE_INFINITY);
    }

    /** @param minimumSealingCsp smallest CSP (m) taken as a continuous smear, from a local calibration */
    public ClaySmearPotentialCriterion(double minimumSealingCsp) {
        if (!(minimumSealingCsp >= 0)) {
            throw new IllegalArgumentException("CSP criterion: minimum sealing CSP must be >= 0 m, was "
                    + minimumSealingCsp);
        }
        this.minimumSealingCsp = minimumSealingCsp;
    }

    public double minimumSealingCsp() {
        return minimumSealingCsp;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Clay smear potential (CSP)";
    }

    @Override
    protected String attributeName() {
        return "CSP";
    }

    @Override
    protected String attributeUnit() {
        return "m";
    }

    @Override
    protected double attribute(ThrowWindow window) {
        double csp = 0;
        for (int index : window.shaleBedsInside()) {
            double thickness = window.column().unit(index).thickness();
            csp += thickness * thickness / window.distanceFromCutOff(index);
        }
        return csp;
    }

    @Override
    protected double faultRockThreshold(double attribute, FaultPointContext ctx) {
        return attribute >= minimumSealingCsp ? Double.POSITIVE_INFINITY : 0;
    }
}
