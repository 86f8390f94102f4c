package org.faultbench.juxtaposition;

/**
 * A connected stretch of the fault plane where one footwall unit faces one hanging-wall unit: a run of adjacent
 * fault-plane columns in which the pair overlaps. Its shallowest point is where a juxtaposition leak would start.
 *
 * @param footwallUnit footwall unit index (-1 overburden, size() underburden)
 * @param hangingWallUnit hanging-wall unit index (-1 overburden, size() underburden)
 * @param juxtapositionClass class of the pair
 * @param selfJuxtaposed whether both sides are the same named unit
 * @param firstColumn first fault-plane column of the run
 * @param lastColumn last fault-plane column of the run
 * @param area sum of interval length x column width over the run (m^2)
 * @param top shallowest point of the window; on ties the one with the smallest u
 */
public record JuxtapositionWindow(int footwallUnit, int hangingWallUnit, JuxtapositionClass juxtapositionClass,
        boolean selfJuxtaposed, int firstColumn, int lastColumn, double area, FaultPlanePoint top) {
}
