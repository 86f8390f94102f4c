package org.faultbench.juxtaposition;

import org.locationtech.jts.geom.Geometry;

/**
 * Outline of a reservoir/reservoir window on the Allan diagram, for drawing. Its numbers (area, shallowest top) are
 * taken from {@link JuxtapositionResult}, which computes them exactly by interval arithmetic.
 *
 * @param footwallUnit footwall reservoir unit index
 * @param hangingWallUnit hanging-wall reservoir unit index
 * @param outline polygon(s) in (u, z): x = along-strike distance, y = depth (positive down)
 */
public record AllanWindow(int footwallUnit, int hangingWallUnit, Geometry outline) {
}
