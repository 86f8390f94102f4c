package org.faultbench.digitize.ui.editing;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.digitize.sketch.TraceSide;

/**
 * The short ticks drawn on the downthrown (hanging-wall) side of a fault trace, the map convention for normal faults
 * (e.g. Tearpock &amp; Bischke 2003, Applied Subsurface Geological Mapping, fault-map symbols): one tick at the middle
 * of every segment, perpendicular to it. Works in drawing units (v down); the side is the side looking along the
 * trace as digitized, as seen on the map (north up), which is the same side in drawing and in map coordinates.
 */
public final class TraceTicks {

    private TraceTicks() {
    }

    /**
     * @param u drawing u of the trace vertices
     * @param v drawing v of the trace vertices
     * @param side the hanging-wall side
     * @param length tick length in drawing units
     * @return one {u0, v0, u1, v1} per segment longer than zero
     */
    public static List<double[]> ticks(double[] u, double[] v, TraceSide side, double length) {
        List<double[]> ticks = new ArrayList<>();
        for (int i = 0; i + 1 < u.length; i++) {
            double du = u[i + 1] - u[i];
            double dv = v[i + 1] - v[i];
            double norm = Math.hypot(du, dv);
            if (norm == 0) {
                continue;
            }
            // with v pointing down, the left of direction (du, dv) as seen on screen is (dv, -du)
            double nu = side == TraceSide.LEFT ? dv / norm : -dv / norm;
            double nv = side == TraceSide.LEFT ? -du / norm : du / norm;
            double mu = (u[i] + u[i + 1]) / 2;
            double mv = (v[i] + v[i + 1]) / 2;
            ticks.add(new double[] { mu, mv, mu + nu * length, mv + nv * length });
        }
        return ticks;
    }
}
