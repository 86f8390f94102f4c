package org.faultbench.digitize.gridding;

import static org.faultbench.digitize.gridding.SyntheticHorizons.GRID;
import static org.faultbench.digitize.gridding.SyntheticHorizons.STEPPED;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.grid.RegularGrid;
import org.junit.jupiter.api.Test;

/**
 * Cut-off depths beside a trace. Horizon: 1000 + 0.1 x west of x = 505, 50 m deeper east (normal fault, footwall
 * west); values are hand calculations on the two planes.
 */
class CutOffExtractorTest {
    private static final double ROUND_OFF = 1e-9;
    private final RegularGrid horizon = RegularGrid.sample(GRID, STEPPED);

    @Test
    void footwallAndHangingWallDepthsAreReadBesideTheTrace() {
        // trace drawn northward: west is on its left
        CutOffSamples samples = new CutOffExtractor(250, 15).extract(horizon, FaultBarriers.none(),
                SyntheticHorizons.line(505, 0, 505, 1000), FootwallSide.LEFT);
        assertArrayEquals(new double[] { 0, 250, 500, 750, 1000 }, samples.u(), ROUND_OFF);
        for (int s = 0; s < samples.size(); s++) {
            // footwall at x = 490: 1049 m; hanging wall at x = 520: 1050 + 52 = 1102 m
            assertEquals(1049, samples.zFootwall()[s], ROUND_OFF);
            assertEquals(1102, samples.zHangingWall()[s], ROUND_OFF);
        }
    }

    @Test
    void sideFollowsTheTraceDirection() {
        // the same trace drawn southward: west is now on its right
        CutOffSamples samples = new CutOffExtractor(300, 15).extract(horizon, FaultBarriers.none(),
                SyntheticHorizons.line(505, 1000, 505, 100), FootwallSide.RIGHT);
        assertEquals(4, samples.size(), "900 m at 300 m spacing: 0, 300, 600, 900");
        assertEquals(1049, samples.zFootwall()[3], ROUND_OFF);
        assertEquals(1102, samples.zHangingWall()[3], ROUND_OFF);
    }

    @Test
    void offsetWithinACellDoesNotMixTheSides() {
        // offset 3 m: both samples lie in cells cut by the trace; only same-side nodes are used
        CutOffSamples samples = new CutOffExtractor(500, 3).extract(horizon, FaultBarriers.none(),
                SyntheticHorizons.line(505, 0, 505, 1000), FootwallSide.LEFT);
        assertEquals(1050, samples.zFootwall()[1], ROUND_OFF, "west nodes at x = 500 only");
        assertEquals(1101, samples.zHangingWall()[1], ROUND_OFF, "east nodes at x = 510 only");
    }

    @Test
    void offTheGridGivesNaN() {
        CutOffSamples samples = new CutOffExtractor(100, 15).extract(horizon, FaultBarriers.none(),
                SyntheticHorizons.line(505, 900, 505, 1100), FootwallSide.LEFT);
        assertTrue(Double.isNaN(samples.zFootwall()[2]), "y = 1100 lies north of the grid");
    }

    @Test
    void badSettingsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new CutOffExtractor(0, 10));
        assertEquals("cut-off station spacing must be a finite number > 0 m, was 0.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new CutOffExtractor(10, Double.NaN));
        assertThrows(IllegalArgumentException.class,
                () -> new CutOffSamples(new double[2], new double[1], new double[2]));
    }
}
