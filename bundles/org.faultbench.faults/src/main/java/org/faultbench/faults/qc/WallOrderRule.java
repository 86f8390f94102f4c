package org.faultbench.faults.qc;

import java.util.Arrays;
import java.util.List;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * Footwall cut-off deeper than the hanging-wall cut-off on a normal fault (or shallower on a reverse fault): the
 * throw has the wrong sense for the fault type (common practice: on a normal fault z_FW &lt; z_HW). Where no part of
 * the profile has the right sense, the walls are swapped or the dip direction is wrong; otherwise usually two faults
 * were joined into one (see {@link PolarityFlipRule}). One finding per stretch of wrong-sense throw, at its largest
 * value.
 */
public final class WallOrderRule extends ProfileScanRule {

    public static final String ID = "footwall-below-hanging-wall";
    /** Wrong-sense throws up to this many metres are picking noise. */
    public static final double DEFAULT_RESOLUTION = 5;

    private final double resolution;

    public WallOrderRule() {
        this(DEFAULT_RESOLUTION);
    }

    /** @param resolution wrong-sense throws (m) of at most this size pass */
    public WallOrderRule(double resolution) {
        super(ID, "Footwall below hanging wall", Severity.ERROR);
        this.resolution = Thresholds.nonNegative(ID, "throw resolution", resolution);
    }

    @Override
    void scan(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, List<QcFinding> findings) {
        double sense = ctx.fault().isNormal() ? 1 : -1;
        boolean whole = Arrays.stream(t).noneMatch(value -> sense * value > resolution);
        int worst = -1;
        int start = -1;
        for (int i = 0; i <= u.length; i++) {
            boolean wrong = i < u.length && sense * t[i] < -resolution;
            if (wrong) {
                start = start < 0 ? i : start;
                worst = worst < 0 || Math.abs(t[i]) > Math.abs(t[worst]) ? i : worst;
            } else if (worst >= 0) {
                findings.add(finding(ctx, profile, u[start], u[i - 1], u[worst], t[worst], whole));
                worst = -1;
                start = -1;
            }
        }
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double from, double to, double at,
            double throwValue, boolean whole) {
        boolean normal = ctx.fault().isNormal();
        String message = "On horizon '" + profile.horizon() + "' the " + (normal ? "footwall" : "hanging-wall")
                + " cut-off lies deeper than the " + (normal ? "hanging-wall" : "footwall") + " cut-off from u = "
                + Numbers.metres(from) + " to " + Numbers.metres(to) + ", by up to "
                + Numbers.metres(Math.abs(throwValue)) + " at u = " + Numbers.metres(at) + ", on a "
                + (normal ? "normal" : "reverse") + " fault.";
        String suggestion = whole
                ? "The whole profile has the wrong sense: the walls are probably swapped or the dip direction is"
                        + " wrong. Swap the walls of the fault, or change it to a " + (normal ? "reverse" : "normal")
                        + " fault if that is what it is."
                : "Only part of the fault has the wrong sense: probably two faults were joined into one. Split the"
                        + " fault where the throw changes sign and swap the walls of the wrong part; otherwise check"
                        + " the cut-off picks.";
        return finding(ctx, profile, at, message, suggestion);
    }
}
