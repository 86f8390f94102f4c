package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * A deeper horizon with clearly less throw than a shallower one at the same place along strike. A fault that moved
 * after all mapped horizons were deposited offsets them all by about the same amount, so throw should not decrease
 * with depth (common practice); less throw at depth points to a mis-picked cut-off or a wrongly correlated horizon,
 * or to the fault's lower tip. Faults marked as growth faults are not checked: the user has accepted that their
 * throw varies with depth. One finding per pair of successive horizons, where the deficit is largest.
 */
public final class DeeperLessThrowRule implements FaultQcRule {

    public static final String ID = "throw-decreases-with-depth";
    /** Throw deficits up to this many metres are picking noise. */
    public static final double DEFAULT_RESOLUTION = 5;
    /** Throw deficits up to this fraction of the shallower throw pass. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 0.1;

    private final double resolution;
    private final double relativeTolerance;

    public DeeperLessThrowRule() {
        this(DEFAULT_RESOLUTION, DEFAULT_RELATIVE_TOLERANCE);
    }

    /**
     * @param resolution deficits (m) of at most this size pass
     * @param relativeTolerance deficits of at most this fraction of the shallower throw pass
     */
    public DeeperLessThrowRule(double resolution, double relativeTolerance) {
        this.resolution = Thresholds.nonNegative(ID, "throw resolution", resolution);
        this.relativeTolerance = Thresholds.fraction(ID, "relative tolerance", relativeTolerance);
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Less throw on a deeper horizon";
    }

    @Override
    public List<QcFinding> check(FaultQcContext ctx) {
        List<QcFinding> findings = new ArrayList<>();
        if (ctx.isGrowthFault()) {
            return findings;
        }
        List<ThrowProfile> profiles = ctx.throwProfiles();
        for (int k = 0; k + 1 < profiles.size(); k++) {
            compare(ctx, profiles.get(k), profiles.get(k + 1), findings);
        }
        return findings;
    }

    private void compare(FaultQcContext ctx, ThrowProfile shallow, ThrowProfile deep, List<QcFinding> findings) {
        double worstExcess = 0;
        double worstU = Double.NaN;
        double[] u = deep.validU();
        double[] deepThrow = deep.validThrows();
        for (int i = 0; i < u.length; i++) {
            double upper = Math.abs(shallow.throwAtU(u[i]));
            double deficit = upper - Math.abs(deepThrow[i]);
            double excess = deficit - Math.max(resolution, relativeTolerance * upper);
            if (excess > worstExcess) {
                worstExcess = excess;
                worstU = u[i];
            }
        }
        if (!Double.isNaN(worstU)) {
            findings.add(finding(ctx, shallow, deep, worstU));
        }
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile shallow, ThrowProfile deep, double u) {
        String message = "At u = " + Numbers.metres(u) + " the deeper horizon '" + deep.horizon() + "' has "
                + Numbers.metres(Math.abs(deep.throwAtU(u))) + " of throw but the shallower horizon '"
                + shallow.horizon() + "' has " + Numbers.metres(Math.abs(shallow.throwAtU(u)))
                + "; throw should not decrease with depth on a fault younger than the mapped horizons.";
        String suggestion = "Check the cut-off picks of both horizons here. If the fault was active while these"
                + " horizons were deposited, mark it as a growth fault; if this is the fault's lower tip, ignore.";
        return new QcFinding(ID, Severity.WARNING, ctx.fault().id(), u, deep.horizon(), message, suggestion);
    }
}
