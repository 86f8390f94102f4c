package org.faultbench.faults.repair;

import java.util.Arrays;
import java.util.Optional;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Wall;

/**
 * Cut-off lines carried over to the new u of an edited fault: cut at a split point, reversed or shifted to join a
 * merged trace, moved to the other wall. Station depths are kept as they are; only cut ends are interpolated.
 */
final class CutOffLines {

    private CutOffLines() {
    }

    /**
     * The part of {@code line} within [from, to], moved onto fault {@code faultId} whose u starts at {@code from};
     * empty when fewer than two stations remain.
     */
    static Optional<CutOffLine> slice(CutOffLine line, String faultId, double from, double to) {
        double[] u = new double[line.stationCount() + 2];
        double[] z = new double[u.length];
        int n = 0;
        if (from > line.minU() && from < line.maxU()) {
            u[n] = 0;
            z[n++] = line.stationOrInterpolatedDepth(from);
        }
        for (int i = 0; i < line.stationCount(); i++) {
            double station = line.stationU(i);
            if (station >= from && station <= to && !(n > 0 && station == from)) {
                u[n] = station - from;
                z[n++] = line.stationDepth(i);
            }
        }
        if (to > line.minU() && to < line.maxU() && u[n - 1] < to - from) {
            u[n] = to - from;
            z[n++] = line.stationOrInterpolatedDepth(to);
        }
        return n < 2 ? Optional.empty()
                : Optional.of(new CutOffLine(faultId, line.horizon(), line.wall(), Arrays.copyOf(u, n),
                        Arrays.copyOf(z, n)));
    }

    /**
     * {@code line} on fault {@code faultId}, its u first reversed within a trace of length {@code traceLength} if
     * {@code reversed}, then shifted by {@code offset}.
     */
    static CutOffLine moved(CutOffLine line, String faultId, boolean reversed, double traceLength, double offset) {
        int n = line.stationCount();
        double[] u = new double[n];
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            int source = reversed ? n - 1 - i : i;
            u[i] = (reversed ? traceLength - line.stationU(source) : line.stationU(source)) + offset;
            z[i] = line.stationDepth(source);
        }
        return new CutOffLine(faultId, line.horizon(), line.wall(), u, z);
    }

    /** {@code first} followed by {@code second} (already on one u); a shared end station is averaged. */
    static CutOffLine joined(CutOffLine first, CutOffLine second) {
        int n = first.stationCount();
        int m = second.stationCount();
        boolean shared = first.maxU() == second.minU();
        double[] u = new double[n + m - (shared ? 1 : 0)];
        double[] z = new double[u.length];
        for (int i = 0; i < n; i++) {
            u[i] = first.stationU(i);
            z[i] = first.stationDepth(i);
        }
        if (shared) {
            z[n - 1] = average(z[n - 1], second.stationDepth(0));
        }
        for (int j = shared ? 1 : 0, k = n; j < m; j++, k++) {
            u[k] = second.stationU(j);
            z[k] = second.stationDepth(j);
        }
        return new CutOffLine(first.faultId(), first.horizon(), first.wall(), u, z);
    }

    /** Mean of two depths, or the one that is known. */
    private static double average(double a, double b) {
        return Double.isNaN(a) ? b : Double.isNaN(b) ? a : (a + b) / 2;
    }

    /** {@code line} assigned to the other wall. */
    static CutOffLine onOtherWall(CutOffLine line) {
        Wall other = line.wall() == Wall.FOOTWALL ? Wall.HANGING_WALL : Wall.FOOTWALL;
        double[] u = new double[line.stationCount()];
        double[] z = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            u[i] = line.stationU(i);
            z[i] = line.stationDepth(i);
        }
        return new CutOffLine(line.faultId(), line.horizon(), other, u, z);
    }
}
