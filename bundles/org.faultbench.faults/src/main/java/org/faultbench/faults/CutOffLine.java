package org.faultbench.faults;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.function.DoubleBinaryOperator;

import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.locationtech.jts.geom.Coordinate;

/**
 * Where one horizon meets the fault plane on one wall: depth z as a function of the along-strike distance u, sampled
 * at stations and linearly interpolated between them. Cut-off lines are the input to throw profiles and Allan
 * diagrams.
 *
 * <p>A station depth may be NaN (no data there, e.g. a null node of a depth grid); the line is then undefined
 * (NaN) between that station and its neighbours, so data gaps are never bridged silently.
 */
public final class CutOffLine {

    private final String faultId;
    private final String horizon;
    private final Wall wall;
    private final double[] u;
    private final double[] z;
    private final PolynomialSplineFunction interpolant;

    /**
     * @param faultId id of the fault the line lies on
     * @param horizon horizon name
     * @param wall wall the line belongs to
     * @param u station along-strike distances, finite and strictly increasing, at least two
     * @param z station depths (positive down, m); NaN means no data at that station
     */
    public CutOffLine(String faultId, String horizon, Wall wall, double[] u, double[] z) {
        if (faultId == null || faultId.isBlank()) {
            throw new IllegalArgumentException("cut-off line: fault id is empty");
        }
        if (horizon == null || horizon.isBlank()) {
            throw new IllegalArgumentException("cut-off line on fault '" + faultId + "': horizon name is empty");
        }
        if (wall == null) {
            throw new IllegalArgumentException("cut-off line of horizon '" + horizon + "': wall is missing");
        }
        this.faultId = faultId;
        this.horizon = horizon;
        this.wall = wall;
        this.u = u.clone();
        this.z = z.clone();
        checkStations();
        this.interpolant = new LinearInterpolator().interpolate(this.u, this.z);
    }

    private void checkStations() {
        if (u.length != z.length) {
            throw new IllegalArgumentException(describe() + ": " + u.length + " u values but " + z.length + " depths");
        }
        if (u.length < 2) {
            throw new IllegalArgumentException(describe() + ": needs at least two stations at different positions"
                    + " along strike, has " + u.length);
        }
        for (int i = 0; i < u.length; i++) {
            if (!Double.isFinite(u[i])) {
                throw new IllegalArgumentException(describe() + ": station " + i + " has u = " + u[i]);
            }
            if (i > 0 && !(u[i] > u[i - 1])) {
                throw new IllegalArgumentException(describe() + ": stations must have increasing u, station " + i
                        + " has u = " + u[i] + " after " + u[i - 1]);
            }
            if (Double.isInfinite(z[i])) {
                throw new IllegalArgumentException(describe() + ": station " + i + " has depth " + z[i]);
            }
        }
    }

    /**
     * Cut-off line from digitized map points carrying depth in z, each projected onto the nearest point of the fault
     * trace. Points that project to the same u (e.g. around the outside of a bend) are averaged.
     */
    public static CutOffLine fromMapPoints(Fault fault, String horizon, Wall wall, List<Coordinate> points) {
        requireWall(wall, horizon);
        String where = "cut-off of horizon '" + horizon + "' on the " + wallName(wall) + " of fault '" + fault.name()
                + "'";
        double[][] projected = new double[points.size()][];
        for (int i = 0; i < points.size(); i++) {
            Coordinate p = points.get(i);
            if (!Double.isFinite(p.x) || !Double.isFinite(p.y)) {
                throw new IllegalArgumentException(where + ": point " + i + " has a non-finite position (" + p.x + ", "
                        + p.y + ")");
            }
            if (!Double.isFinite(p.getZ())) {
                throw new IllegalArgumentException(where + ": point " + i + " at (" + p.x + ", " + p.y
                        + ") has no valid depth (z = " + p.getZ() + ")");
            }
            projected[i] = new double[] {fault.project(p.x, p.y), p.getZ()};
        }
        Arrays.sort(projected, Comparator.comparingDouble(station -> station[0]));
        return averagedStations(fault.id(), horizon, wall, projected);
    }

    private static CutOffLine averagedStations(String faultId, String horizon, Wall wall, double[][] sorted) {
        double[] u = new double[sorted.length];
        double[] z = new double[sorted.length];
        int n = 0;
        int start = 0;
        while (start < sorted.length) {
            int end = start;
            double sum = 0;
            while (end < sorted.length && sorted[end][0] == sorted[start][0]) {
                sum += sorted[end++][1];
            }
            u[n] = sorted[start][0];
            z[n++] = sum / (end - start);
            start = end;
        }
        return new CutOffLine(faultId, horizon, wall, Arrays.copyOf(u, n), Arrays.copyOf(z, n));
    }

    /**
     * Cut-off line sampled from a depth surface at {@code stations} evenly spaced points from u = 0 to the trace
     * end, each read at a horizontal {@code offset} from the trace, perpendicular to it, on {@code wall}.
     *
     * <p>Approximation: the true cut-off is where the horizon meets the (dipping) fault plane. Reading the surface a
     * fixed distance off the trace on each side stands in for that: it skips the disturbed, badly gridded zone next to
     * the fault but ignores the heave (the horizontal gap between footwall and hanging-wall cut-offs, throw / tan dip)
     * and any drag within the offset. Choose the offset just beyond the fault zone and gridding artefacts; the trace
     * should be the fault's trace on (or near) this horizon.
     *
     * @param depthAt depth (positive down) at map (x, y); NaN where the surface has no value
     */
    public static CutOffLine sampled(Fault fault, String horizon, Wall wall, DoubleBinaryOperator depthAt,
            double offset, int stations) {
        requireWall(wall, horizon);
        if (stations < 2) {
            throw new IllegalArgumentException("cut-off of horizon '" + horizon + "' on fault '" + fault.name()
                    + "': needs at least 2 stations, was " + stations);
        }
        double[] u = new double[stations];
        double[] z = new double[stations];
        for (int i = 0; i < stations; i++) {
            u[i] = i == stations - 1 ? fault.length() : fault.length() * i / (stations - 1);
            Coordinate p = fault.positionAt(u[i], wall, offset);
            z[i] = depthAt.applyAsDouble(p.x, p.y);
        }
        return new CutOffLine(fault.id(), horizon, wall, u, z);
    }

    /** Depth at along-strike distance {@code u}; NaN outside [minU, maxU] or next to a station without depth. */
    public double depthAt(double u) {
        return interpolant.isValidPoint(u) ? interpolant.value(u) : Double.NaN;
    }

    /**
     * Depth at {@code u}: a station's own depth where {@code u} is a station, otherwise {@link #depthAt(double)}.
     * A station next to a gap keeps its depth here, so lines cut or differenced at their stations do not lose data.
     */
    public double stationOrInterpolatedDepth(double u) {
        int station = Arrays.binarySearch(this.u, u);
        return station >= 0 ? z[station] : depthAt(u);
    }

    public String faultId() {
        return faultId;
    }

    public String horizon() {
        return horizon;
    }

    public Wall wall() {
        return wall;
    }

    public int stationCount() {
        return u.length;
    }

    public double stationU(int index) {
        return u[index];
    }

    public double stationDepth(int index) {
        return z[index];
    }

    public double minU() {
        return u[0];
    }

    public double maxU() {
        return u[u.length - 1];
    }

    private String describe() {
        return "cut-off of horizon '" + horizon + "' on the " + wallName(wall) + " of fault '" + faultId + "'";
    }

    private static void requireWall(Wall wall, String horizon) {
        if (wall == null) {
            throw new IllegalArgumentException("cut-off line of horizon '" + horizon + "': wall is missing");
        }
    }

    static String wallName(Wall wall) {
        return wall == Wall.HANGING_WALL ? "hanging wall" : "footwall";
    }
}
