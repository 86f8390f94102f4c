package org.faultbench.digitize.ui.editing;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.digitize.sketch.TraceSide;

/**
 * The short ticks drawn on the downthrown (hanging-wall) side of a fault trace, the map convention for normal faults
 * (e.g. Tearpock &amp; Bischke 2003, Applied Subsurface Geological Mapping, fault-map symbols): ticks at a regular spacing
 * along the trace, perpendicular to it. Works in drawing units (v down); the side is the side looking along the
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
     * @param spacing distance between ticks along the trace in drawing units; ticks start and end half a spacing
     *        from the ends, and a trace shorter than one spacing gets one tick at its middle
     * @return one {u0, v0, u1, v1} per tick
     */
    public static List<double[]> ticks(double[] u, double[] v, TraceSide side, double length, double spacing) {
        double total = 0;
        for (int i = 0; i + 1 < u.length; i++) {
            total += Math.hypot(u[i + 1] - u[i], v[i + 1] - v[i]);
        }
        List<double[]> ticks = new ArrayList<>();
        if (total == 0) {
            return ticks;
        }
        double next = total < spacing ? total / 2 : spacing / 2;
        double last = total < spacing ? total / 2 : total - spacing / 2;
        double walked = 0;
        for (int i = 0; i + 1 < u.length; i++) {
            double du = u[i + 1] - u[i];
            double dv = v[i + 1] - v[i];
            double norm = Math.hypot(du, dv);
            // with v pointing down, the left of direction (du, dv) as seen on screen is (dv, -du)
            double nu = side == TraceSide.LEFT ? dv / norm : -dv / norm;
            double nv = side == TraceSide.LEFT ? -du / norm : du / norm;
            while (norm > 0 && next <= walked + norm && next <= last + 1e-9) {
                double t = (next - walked) / norm;
                double mu = u[i] + t * du;
                double mv = v[i] + t * dv;
                ticks.add(new double[] { mu, mv, mu + nu * length, mv + nv * length });
                next += spacing;
            }
            walked += norm;
        }
        return ticks;
    }
}
