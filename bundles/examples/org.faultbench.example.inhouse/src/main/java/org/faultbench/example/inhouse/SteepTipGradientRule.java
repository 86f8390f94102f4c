package org.faultbench.example.inhouse;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.IntPredicate;

import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.qc.FaultQcContext;
import org.faultbench.faults.qc.FaultQcRule;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.Severity;

/**
 * Throw falling too steeply towards an end of a fault. Towards the tip of an isolated fault throw tapers gently;
 * near-tip throw gradients above about 0.1 (m of throw per m along strike) mark a tip restricted by another fault, a
 * relay, or a mis-picked cut-off (Nicol, Watterson, Walsh &amp; Childs 1996, J. Struct. Geol. 18, on near-tip
 * gradients of restricted faults; the limit 0.1 is from memory and a starting value, common practice is to tune it).
 * Looks at the stations within {@code tipFraction} of the profile's length from each end.
 */
public final class SteepTipGradientRule implements FaultQcRule {

    public static final String ID = "example.steep-tip-gradient";
    public static final double DEFAULT_MAX_GRADIENT = 0.1;
    public static final double DEFAULT_TIP_FRACTION = 0.2;
    /** Throw changes (m) at or below this are picking noise (common practice: about a seismic sample). */
    public static final double DEFAULT_RESOLUTION = 5;

    private final double maxGradient;
    private final double tipFraction;
    private final double resolution;

    /** The registry creates the rule with its defaults. */
    public SteepTipGradientRule() {
        this(DEFAULT_MAX_GRADIENT, DEFAULT_TIP_FRACTION, DEFAULT_RESOLUTION);
    }

    public SteepTipGradientRule(double maxGradient, double tipFraction, double resolution) {
        if (!(maxGradient > 0) || !(tipFraction > 0 && tipFraction <= 0.5) || !(resolution >= 0)) {
            throw new IllegalArgumentException(ID + ": need maximum gradient > 0, tip fraction in (0, 0.5] and "
                    + "resolution >= 0; got " + maxGradient + ", " + tipFraction + ", " + resolution);
        }
        this.maxGradient = maxGradient;
        this.tipFraction = tipFraction;
        this.resolution = resolution;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Steep throw gradient near a tip";
    }

    @Override
    public List<QcFinding> check(FaultQcContext ctx) {
        List<QcFinding> findings = new ArrayList<>();
        for (ThrowProfile profile : ctx.throwProfiles()) {
            double[] u = profile.validU();
            double[] t = profile.validThrows();
            if (u.length < 2) {
                continue;
            }
            double tipZone = tipFraction * (u[u.length - 1] - u[0]);
            steepest(u, t, i -> u[i + 1] - u[0] <= tipZone)
                    .ifPresent(i -> findings.add(finding(ctx, profile, u, t, i)));
            steepest(u, t, i -> u[u.length - 1] - u[i] <= tipZone)
                    .ifPresent(i -> findings.add(finding(ctx, profile, u, t, i)));
        }
        return findings;
    }

    /** Index i of the steepest too-steep step (i, i+1) among the steps the filter admits. */
    private Optional<Integer> steepest(double[] u, double[] t, IntPredicate inZone) {
        Integer best = null;
        for (int i = 0; i + 1 < u.length; i++) {
            if (inZone.test(i) && Math.abs(t[i + 1] - t[i]) > resolution && gradient(u, t, i) > maxGradient
                    && (best == null || gradient(u, t, i) > gradient(u, t, best))) {
                best = i;
            }
        }
        return Optional.ofNullable(best);
    }

    private static double gradient(double[] u, double[] t, int i) {
        return Math.abs(t[i + 1] - t[i]) / (u[i + 1] - u[i]);
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, int i) {
        String message = String.format(Locale.ROOT, "Throw on horizon '%s' changes by %.1f m over %.1f m near the "
                + "end of the data at u = %.1f m (gradient %.3f, limit %.3f).", profile.horizon(), t[i + 1] - t[i],
                u[i + 1] - u[i], (u[i] + u[i + 1]) / 2, gradient(u, t, i), maxGradient);
        return new QcFinding(ID, Severity.WARNING, ctx.fault().id(), (u[i] + u[i + 1]) / 2, profile.horizon(),
                message, "Check the cut-off picks near this tip; if they are right, look for a fault the tip abuts "
                        + "or a relay with a neighbouring segment.");
    }
}
