package org.faultbench.faults.qc;

import java.util.List;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * Throw that changes sign along one mapped fault. A single fault keeps its sense of throw; a flip usually means two
 * faults dipping in opposite directions were correlated into one trace across a relay or accommodation zone,
 * sometimes swapped walls or mis-picked horizons (common practice). Scissor faults that really flip are rare in
 * normal-fault systems.
 */
public final class PolarityFlipRule extends ProfileScanRule {

    public static final String ID = "throw-polarity-flip";
    /** Throws smaller than this have no reliable sign (a few metres; set to the data's vertical resolution). */
    public static final double DEFAULT_RESOLUTION = 5;

    private final double resolution;

    public PolarityFlipRule() {
        this(DEFAULT_RESOLUTION);
    }

    /** @param resolution throws of at most this size (m) count as zero */
    public PolarityFlipRule(double resolution) {
        super(ID, "Throw polarity flip", Severity.WARNING);
        this.resolution = Thresholds.nonNegative(ID, "throw resolution", resolution);
    }

    @Override
    void scan(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, List<QcFinding> findings) {
        int last = -1;
        for (int i = 0; i < t.length; i++) {
            if (Math.abs(t[i]) <= resolution) {
                continue;
            }
            if (last >= 0 && Math.signum(t[i]) != Math.signum(t[last])) {
                findings.add(finding(ctx, profile, u, t, last, i));
            }
            last = i;
        }
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, int before,
            int after) {
        double flip = crossing(u, t, before, after);
        String message = "Throw on horizon '" + profile.horizon() + "' changes sign near u = " + Numbers.metres(flip)
                + ": " + Numbers.metres(t[before]) + " at u = " + Numbers.metres(u[before]) + ", "
                + Numbers.metres(t[after]) + " at u = " + Numbers.metres(u[after])
                + ". A single fault keeps one sense of throw along strike.";
        String suggestion = "Check whether two faults dipping in opposite directions were joined across a relay here;"
                + " if so, split the fault at u = " + Numbers.metres(flip) + " and swap the walls of the part with"
                + " the wrong sense of throw. Otherwise check the wall assignment and the horizon picks.";
        return finding(ctx, profile, flip, message, suggestion);
    }

    /** Zero crossing between neighbouring stations; across a near-zero stretch, its station of least throw. */
    private static double crossing(double[] u, double[] t, int before, int after) {
        if (after == before + 1) {
            return u[before] + (u[after] - u[before]) * t[before] / (t[before] - t[after]);
        }
        int least = before + 1;
        for (int i = before + 2; i < after; i++) {
            if (Math.abs(t[i]) < Math.abs(t[least])) {
                least = i;
            }
        }
        return u[least];
    }
}
