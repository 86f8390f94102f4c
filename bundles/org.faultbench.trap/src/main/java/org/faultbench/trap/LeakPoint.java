package org.faultbench.trap;

/**
 * The fault point that limits the column, and the free-water level it allows.
 *
 * @param candidate the controlling leak candidate
 * @param freeWaterLevel deepest free-water level the candidate supports: z + P_th / ((rho_w - rho_hc) g), metres
 */
public record LeakPoint(LeakCandidate candidate, double freeWaterLevel) {

    public LeakPoint {
        if (candidate == null || !Double.isFinite(freeWaterLevel)) {
            throw new IllegalArgumentException("leak point needs a candidate and a finite free-water level, was "
                    + candidate + ", " + freeWaterLevel);
        }
    }
}
