package org.faultbench.faults.qc;

import java.util.List;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * Abrupt changes of throw along strike. Throw on a fault varies smoothly; a step between neighbouring stations is
 * most often a mis-picked cut-off or a wrongly correlated horizon, sometimes the boundary of linked segments or a
 * crossing fault (common practice). One finding per run of steep steps, at its steepest step.
 */
public final class ThrowGradientRule extends ProfileScanRule {

    public static final String ID = "throw-gradient";
    /**
     * Throw change per metre along strike above which a step is abrupt: a starting value (common practice), to be
     * tuned to the data; throw gradients on isolated normal faults mostly stay below about 0.1 (from memory).
     */
    public static final double DEFAULT_MAX_GRADIENT = 0.2;
    /** Steps of at most this throw change (m) are within picking noise however short the station spacing. */
    public static final double DEFAULT_RESOLUTION = 5;

    private final double maxGradient;
    private final double resolution;

    public ThrowGradientRule() {
        this(DEFAULT_MAX_GRADIENT, DEFAULT_RESOLUTION);
    }

    /**
     * @param maxGradient largest acceptable |d throw / du| (m/m)
     * @param resolution throw changes (m) of at most this size pass
     */
    public ThrowGradientRule(double maxGradient, double resolution) {
        super(ID, "Abrupt throw gradient", Severity.WARNING);
        this.maxGradient = Thresholds.nonNegative(ID, "maximum throw gradient", maxGradient);
        this.resolution = Thresholds.nonNegative(ID, "throw resolution", resolution);
    }

    @Override
    void scan(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, List<QcFinding> findings) {
        int steepest = -1;
        for (int i = 0; i + 1 < u.length; i++) {
            boolean steep = isSteep(u, t, i);
            if (steep && (steepest < 0 || gradient(u, t, i) > gradient(u, t, steepest))) {
                steepest = i;
            }
            if (!steep && steepest >= 0) {
                findings.add(finding(ctx, profile, u, t, steepest));
                steepest = -1;
            }
        }
        if (steepest >= 0) {
            findings.add(finding(ctx, profile, u, t, steepest));
        }
    }

    private boolean isSteep(double[] u, double[] t, int i) {
        return Math.abs(t[i + 1] - t[i]) > resolution && gradient(u, t, i) > maxGradient;
    }

    private static double gradient(double[] u, double[] t, int i) {
        return Math.abs(t[i + 1] - t[i]) / (u[i + 1] - u[i]);
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, int i) {
        double middle = (u[i] + u[i + 1]) / 2;
        String message = "Throw on horizon '" + profile.horizon() + "' changes by " + Numbers.metres(t[i + 1] - t[i])
                + " over " + Numbers.metres(u[i + 1] - u[i]) + " along strike between u = " + Numbers.metres(u[i])
                + " and " + Numbers.metres(u[i + 1]) + " (gradient " + Numbers.ratio(gradient(u, t, i))
                + ", limit " + Numbers.ratio(maxGradient) + ").";
        String suggestion = "Check the footwall and hanging-wall cut-off picks here for a mis-pick or a horizon"
                + " correlated across the wrong reflector; a real step may mark a segment boundary or a crossing"
                + " fault.";
        return finding(ctx, profile, middle, message, suggestion);
    }
}
