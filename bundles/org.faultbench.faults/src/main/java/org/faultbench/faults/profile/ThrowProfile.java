package org.faultbench.faults.profile;

import java.util.Arrays;

import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.interpolation.LoessInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.faultbench.faults.CutOffLine;

/**
 * Throw of one horizon along one fault: throw(u) = hanging-wall minus footwall cut-off depth at stations along
 * strike, positive where the hanging wall is down (normal sense). This is what a geologist reads to judge whether a
 * mapped fault is one fault: its shape, its tips and its sign.
 *
 * <p>A throw may be NaN (no data at that station); the profile is then undefined between that station and its
 * neighbours, so gaps are never bridged silently.
 */
public final class ThrowProfile {

    private final String faultId;
    private final String horizon;
    private final double[] u;
    private final double[] throwValues;
    private final PolynomialSplineFunction interpolant;

    /**
     * @param faultId id of the fault
     * @param horizon horizon name
     * @param u station along-strike distances (m), finite and strictly increasing, at least two
     * @param throwValues throw per station (m, positive = hanging wall down); NaN = no data
     */
    public ThrowProfile(String faultId, String horizon, double[] u, double[] throwValues) {
        if (faultId == null || faultId.isBlank()) {
            throw new IllegalArgumentException("throw profile: fault id is empty");
        }
        if (horizon == null || horizon.isBlank()) {
            throw new IllegalArgumentException("throw profile on fault '" + faultId + "': horizon name is empty");
        }
        this.faultId = faultId;
        this.horizon = horizon;
        this.u = u.clone();
        this.throwValues = throwValues.clone();
        checkStations();
        this.interpolant = new LinearInterpolator().interpolate(this.u, this.throwValues);
    }

    private void checkStations() {
        if (u.length != throwValues.length) {
            throw new IllegalArgumentException(describe() + ": " + u.length + " u values but " + throwValues.length
                    + " throws");
        }
        if (u.length < 2) {
            throw new IllegalArgumentException(describe() + ": needs at least two stations, has " + u.length);
        }
        for (int i = 0; i < u.length; i++) {
            if (!Double.isFinite(u[i]) || (i > 0 && !(u[i] > u[i - 1]))) {
                throw new IllegalArgumentException(describe() + ": stations must have finite, increasing u; station "
                        + i + " has u = " + u[i]);
            }
            if (Double.isInfinite(throwValues[i])) {
                throw new IllegalArgumentException(describe() + ": station " + i + " has throw " + throwValues[i]);
            }
        }
    }

    /**
     * The profile between a horizon's footwall and hanging-wall cut-off lines, at every station of either line
     * inside the stretch where both are defined.
     */
    public static ThrowProfile of(CutOffPair cutOffs) {
        CutOffLine footwall = cutOffs.footwall();
        CutOffLine hangingWall = cutOffs.hangingWall();
        double start = Math.max(footwall.minU(), hangingWall.minU());
        double end = Math.min(footwall.maxU(), hangingWall.maxU());
        if (!(end > start)) {
            throw new IllegalArgumentException("horizon '" + cutOffs.horizon() + "' on fault '" + cutOffs.faultId()
                    + "': footwall and hanging-wall cut-offs do not overlap along strike");
        }
        double[] stations = stationsBetween(start, end, footwall, hangingWall);
        double[] throwValues = new double[stations.length];
        for (int i = 0; i < stations.length; i++) {
            throwValues[i] = hangingWall.stationOrInterpolatedDepth(stations[i])
                    - footwall.stationOrInterpolatedDepth(stations[i]);
        }
        return new ThrowProfile(cutOffs.faultId(), cutOffs.horizon(), stations, throwValues);
    }

    private static double[] stationsBetween(double start, double end, CutOffLine... lines) {
        double[] all = new double[2 + Arrays.stream(lines).mapToInt(CutOffLine::stationCount).sum()];
        int n = 0;
        all[n++] = start;
        all[n++] = end;
        for (CutOffLine line : lines) {
            for (int i = 0; i < line.stationCount(); i++) {
                double station = line.stationU(i);
                if (station > start && station < end) {
                    all[n++] = station;
                }
            }
        }
        return Arrays.stream(all, 0, n).sorted().distinct().toArray();
    }

    /**
     * A copy smoothed by robust local regression (LOESS, Cleveland 1979) to damp noisy cut-off picks before reading
     * gradients. Stations without data stay without data.
     *
     * @param bandwidth fraction of the stations used for each local fit, in (0, 1]; larger is smoother
     */
    public ThrowProfile smoothed(double bandwidth) {
        double[] validU = validU();
        if (!(bandwidth > 0 && bandwidth <= 1)) {
            throw new IllegalArgumentException(describe() + ": smoothing bandwidth must be in (0, 1], was "
                    + bandwidth);
        }
        if (bandwidth * validU.length < 3) {
            throw new IllegalArgumentException(describe() + ": smoothing bandwidth " + bandwidth + " covers fewer than"
                    + " 3 of the " + validU.length + " stations with data; use a larger bandwidth");
        }
        double[] smooth = new LoessInterpolator(bandwidth, 2).smooth(validU, validThrows());
        double[] result = throwValues.clone();
        for (int i = 0, k = 0; i < result.length; i++) {
            if (!Double.isNaN(result[i])) {
                result[i] = smooth[k++];
            }
        }
        return new ThrowProfile(faultId, horizon, u, result);
    }

    public String faultId() {
        return faultId;
    }

    public String horizon() {
        return horizon;
    }

    public int size() {
        return u.length;
    }

    public double u(int station) {
        return u[station];
    }

    /** Throw at a station (m); NaN = no data. */
    public double throwAt(int station) {
        return throwValues[station];
    }

    /** Throw at along-strike distance {@code u}, linearly interpolated; NaN outside the profile or next to a gap. */
    public double throwAtU(double position) {
        return interpolant.isValidPoint(position) ? interpolant.value(position) : Double.NaN;
    }

    public double minU() {
        return u[0];
    }

    public double maxU() {
        return u[u.length - 1];
    }

    /** Along-strike distances of the stations that have data. */
    public double[] validU() {
        return valid(u);
    }

    /** Throws of the stations that have data, in the order of {@link #validU()}. */
    public double[] validThrows() {
        return valid(throwValues);
    }

    private double[] valid(double[] values) {
        double[] result = new double[values.length];
        int n = 0;
        for (int i = 0; i < values.length; i++) {
            if (!Double.isNaN(throwValues[i])) {
                result[n++] = values[i];
            }
        }
        return Arrays.copyOf(result, n);
    }

    /** Largest absolute throw over the stations with data; NaN when no station has data. */
    public double maxAbsThrow() {
        return Arrays.stream(validThrows()).map(Math::abs).max().orElse(Double.NaN);
    }

    private String describe() {
        return "throw profile of horizon '" + horizon + "' on fault '" + faultId + "'";
    }

    @Override
    public String toString() {
        return "ThrowProfile[" + faultId + ", " + horizon + ", " + u.length + " stations]";
    }
}
