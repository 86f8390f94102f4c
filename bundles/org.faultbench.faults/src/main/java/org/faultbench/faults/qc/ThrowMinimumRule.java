package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * A marked local minimum of throw between two higher parts of one fault. Segments that grew separately and linked
 * keep a throw low at their former relay (Peacock &amp; Sanderson 1991, from memory); a deep minimum therefore marks
 * a possible relay or segment boundary, or a mis-pick. One finding per trough, at its lowest station.
 */
public final class ThrowMinimumRule extends ProfileScanRule {

    public static final String ID = "throw-minimum";
    /** A trough must be at least this fraction below the lower of the maxima on either side. */
    public static final double DEFAULT_DEPTH_FRACTION = 0.3;
    /** A trough must be deeper than this (m) to be more than picking noise. */
    public static final double DEFAULT_RESOLUTION = 5;

    private final double depthFraction;
    private final double resolution;

    public ThrowMinimumRule() {
        this(DEFAULT_DEPTH_FRACTION, DEFAULT_RESOLUTION);
    }

    /**
     * @param depthFraction how far below the lower flanking maximum a trough must reach, as a fraction of it
     * @param resolution troughs of at most this depth (m) pass
     */
    public ThrowMinimumRule(double depthFraction, double resolution) {
        super(ID, "Local throw minimum", Severity.WARNING);
        this.depthFraction = Thresholds.fraction(ID, "trough depth fraction", depthFraction);
        this.resolution = Thresholds.nonNegative(ID, "throw resolution", resolution);
    }

    @Override
    void scan(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] size, List<QcFinding> findings) {
        for (int i = 0; i < size.length; i++) {
            size[i] = Math.abs(size[i]);
        }
        for (int lowest : troughs(size)) {
            findings.add(finding(ctx, profile, u, size, lowest));
        }
    }

    /**
     * Lowest station of every trough deep enough. A station's flanks are the highest throws on either side before
     * the throw falls below it again (its prominence), so noise inside one trough does not make several troughs.
     */
    private List<Integer> troughs(double[] size) {
        List<Integer> lowest = new ArrayList<>();
        for (int i = 1; i + 1 < size.length; i++) {
            double flank = Math.min(leftFlank(size, i), rightFlank(size, i));
            if (size[i] < (1 - depthFraction) * flank && flank - size[i] > resolution) {
                lowest.add(i);
            }
        }
        return lowest;
    }

    private static double leftFlank(double[] size, int i) {
        double flank = size[i];
        for (int k = i - 1; k >= 0 && size[k] >= size[i]; k--) {
            flank = Math.max(flank, size[k]);
        }
        return flank;
    }

    private static double rightFlank(double[] size, int i) {
        double flank = size[i];
        for (int k = i + 1; k < size.length && size[k] > size[i]; k++) {
            flank = Math.max(flank, size[k]);
        }
        return flank;
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] size, int lowest) {
        double left = leftFlank(size, lowest);
        double right = rightFlank(size, lowest);
        String message = "Throw on horizon '" + profile.horizon() + "' drops to " + Numbers.metres(size[lowest])
                + " at u = " + Numbers.metres(u[lowest]) + " between maxima of " + Numbers.metres(left) + " and "
                + Numbers.metres(right) + ".";
        String suggestion = "A marked throw minimum often marks a relay ramp or the boundary of two linked segments:"
                + " check whether two overlapping faults were joined here and split the fault if so; otherwise check"
                + " the cut-off picks.";
        return finding(ctx, profile, u[lowest], message, suggestion);
    }
}
