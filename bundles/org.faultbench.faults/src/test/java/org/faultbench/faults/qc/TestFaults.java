package org.faultbench.faults.qc;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.BellProfile;
import org.faultbench.faults.profile.CutOffPair;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/** Synthetic faults and cut-offs for QC and repair tests: straight traces along x, throws given as functions of u. */
public final class TestFaults {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private TestFaults() {
    }

    /** Normal fault from (x0, y) to (x0 + length, y), dipping 60 degrees south (hanging wall south of the trace). */
    public static Fault eastWest(String id, double x0, double y, double length) {
        return new Fault(id, "Fault " + id, GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(x0, y), new Coordinate(x0 + length, y)}), 60, 180, true);
    }

    /** Stations from {@code from} to {@code to} every {@code step}. */
    public static double[] stations(double from, double to, double step) {
        int n = (int) Math.round((to - from) / step) + 1;
        double[] u = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = from + step * i;
        }
        return u;
    }

    /** Bell profile (Walsh &amp; Watterson 1987 shape) of maximum {@code dmax} centred at {@code centre}. */
    public static DoubleUnaryOperator bell(double dmax, double centre, double halfLength) {
        BellProfile shape = new BellProfile();
        return u -> dmax * shape.value((u - centre) / halfLength);
    }

    /**
     * Normal throw +80 m on u in [0, 2000] and reverse throw -60 m on [2000, 4000]: two opposite-dipping faults
     * correlated into one 4 km trace, meeting at u = 2000 m.
     */
    public static DoubleUnaryOperator twoOppositeSegments() {
        DoubleUnaryOperator first = bell(80, 1000, 1000);
        DoubleUnaryOperator second = bell(-60, 3000, 1000);
        return u -> u <= 2000 ? first.applyAsDouble(u) : second.applyAsDouble(u);
    }

    /** Footwall line at constant depth {@code footwallDepth}, hanging wall {@code throwAt(u)} deeper. */
    public static CutOffPair pair(String faultId, String horizon, double footwallDepth, double[] u,
            DoubleUnaryOperator throwAt) {
        double[] footwall = new double[u.length];
        double[] hangingWall = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            footwall[i] = footwallDepth;
            hangingWall[i] = footwallDepth + throwAt.applyAsDouble(u[i]);
        }
        return new CutOffPair(new CutOffLine(faultId, horizon, Wall.FOOTWALL, u, footwall),
                new CutOffLine(faultId, horizon, Wall.HANGING_WALL, u, hangingWall));
    }

    /** Context of a fault alone, no map extent, not a growth fault. */
    public static FaultQcContext alone(Fault fault, CutOffPair... pairs) {
        return new FaultQcContext(fault, List.of(pairs), List.of(), null, false);
    }
}
