package org.faultbench.faults.qc;

import java.util.List;
import java.util.Optional;

import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.ThrowProfile;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;

/**
 * Throw that does not die out at an end of a fault. Throw decays towards the tips of an isolated fault; a large throw
 * at an end means the trace stops short of the tip or the fault links with another segment, unless the fault abuts
 * another fault or leaves the mapped area there (common practice).
 */
public final class TipThrowRule extends ProfileScanRule {

    public static final String ID = "throw-at-tip";
    /** Smallest end throw (m) worth a finding: below this a tip is within seismic resolution. */
    public static final double DEFAULT_MINIMUM_THROW = 10;
    /** End throw as a fraction of the profile's largest throw above which the end is no tip. */
    public static final double DEFAULT_FRACTION_OF_MAXIMUM = 0.2;
    /** Another trace or the map edge within this distance (m) of the end explains the throw there. */
    public static final double DEFAULT_SNAP_DISTANCE = 100;

    private final double minimumThrow;
    private final double fractionOfMaximum;
    private final double snapDistance;

    public TipThrowRule() {
        this(DEFAULT_MINIMUM_THROW, DEFAULT_FRACTION_OF_MAXIMUM, DEFAULT_SNAP_DISTANCE);
    }

    /**
     * @param minimumThrow end throws (m) of at most this size pass
     * @param fractionOfMaximum end throws of at most this fraction of the largest throw pass
     * @param snapDistance an end this close (m) to another fault or to the map edge is explained
     */
    public TipThrowRule(double minimumThrow, double fractionOfMaximum, double snapDistance) {
        super(ID, "Throw at a fault end", Severity.WARNING);
        this.minimumThrow = Thresholds.nonNegative(ID, "minimum end throw", minimumThrow);
        this.fractionOfMaximum = Thresholds.fraction(ID, "fraction of the largest throw", fractionOfMaximum);
        this.snapDistance = Thresholds.nonNegative(ID, "snap distance", snapDistance);
    }

    @Override
    void scan(FaultQcContext ctx, ThrowProfile profile, double[] u, double[] t, List<QcFinding> findings) {
        if (u.length == 0) {
            return;
        }
        double limit = Math.max(minimumThrow, fractionOfMaximum * profile.maxAbsThrow());
        for (int end : new int[] {0, u.length - 1}) {
            if (Math.abs(t[end]) > limit && !explained(ctx, u[end])) {
                findings.add(finding(ctx, profile, u[end], t[end]));
            }
        }
    }

    private boolean explained(FaultQcContext ctx, double u) {
        Fault fault = ctx.fault();
        Coordinate end = fault.positionAt(Math.min(Math.max(u, 0), fault.length()));
        Optional<Fault> abutting = FaultIntersections.nearestWithin(end, ctx.otherFaults(), snapDistance);
        return abutting.isPresent() || ctx.mapExtent().map(extent -> nearEdge(extent, end)).orElse(false);
    }

    private boolean nearEdge(Envelope extent, Coordinate point) {
        double inside = Math.min(Math.min(point.x - extent.getMinX(), extent.getMaxX() - point.x),
                Math.min(point.y - extent.getMinY(), extent.getMaxY() - point.y));
        return inside <= snapDistance;
    }

    private QcFinding finding(FaultQcContext ctx, ThrowProfile profile, double u, double throwValue) {
        String message = "Throw on horizon '" + profile.horizon() + "' is still " + Numbers.metres(throwValue)
                + " at the end of the data (u = " + Numbers.metres(u) + "), where it should die out towards a tip;"
                + " no other fault and no map edge lies within " + Numbers.metres(snapDistance) + " of that end.";
        String suggestion = "Extend the trace to where the throw dies out, or join it to the fault it links with."
                + " If the horizon is eroded or the data end here, the finding can be ignored.";
        return finding(ctx, profile, u, message, suggestion);
    }
}
