package org.faultbench.digitize.gridding;

import static org.faultbench.digitize.gridding.SyntheticHorizons.GRID;
import static org.faultbench.digitize.gridding.SyntheticHorizons.STEPPED;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.grid.RegularGrid;
import org.junit.jupiter.api.Test;

/** Reading a grid beside a fault; expected values are hand calculations on planes. */
class SurfaceSamplerTest {
    private static final double ROUND_OFF = 1e-9;
    private final RegularGrid stepped = RegularGrid.sample(GRID, STEPPED);

    @Test
    void awayFromFaultsItIsBilinear() {
        SurfaceSampler sampler = new SurfaceSampler(stepped, SyntheticHorizons.faultTrace());
        // plane 1000 + 0.1 x at x = 123.4: 1012.34 m
        assertEquals(1012.34, sampler.valueAt(123.4, 456.7), ROUND_OFF);
        RegularGrid ramp = RegularGrid.sample(GRID, (x, y) -> x * y);
        // bilinear in cell (10..20) x (10..20): x y is itself bilinear, so 15 x 12 = 180 exactly
        assertEquals(180, new SurfaceSampler(ramp, FaultBarriers.none()).valueAt(15, 12), ROUND_OFF);
    }

    @Test
    void nodesAcrossTheFaultAreNotMixedIn() {
        SurfaceSampler sampler = new SurfaceSampler(stepped, SyntheticHorizons.faultTrace());
        // x = 503 lies between nodes at 500 (west) and 510 (east, across the trace at 505): only the two west
        // nodes are usable and both hold 1050, so no east value (1101) leaks in
        double west = sampler.valueAt(503, 400);
        assertEquals(1050, west, ROUND_OFF);
        assertEquals(1101.0, sampler.valueAt(509, 400), ROUND_OFF, "east side: 1050 + 0.1 x 510 m node values");
        RegularGrid blind = RegularGrid.sample(GRID, STEPPED);
        double smeared = new SurfaceSampler(blind, FaultBarriers.none()).valueAt(503, 400);
        // control: plain bilinear mixes in the hanging wall: 1050 + 0.3 x (1101 - 1050) = 1065.3 m
        assertEquals(1065.3, smeared, ROUND_OFF);
    }

    @Test
    void threeUsableNodesGiveTheirPlane() {
        // diagonal fault cutting off only the north-east node of the cell (500..510) x (500..510)
        FaultBarriers diagonal = FaultBarriers.of(List.of(SyntheticHorizons.line(505, 520, 520, 505)), List.of());
        RegularGrid plane = RegularGrid.sample(GRID, (x, y) -> 2000 + 0.3 * x - 0.2 * y);
        // plane at (502, 503): 2000 + 150.6 - 100.6 = 2050 m, reproduced from the three usable nodes
        assertEquals(2050, new SurfaceSampler(plane, diagonal).valueAt(502, 503), ROUND_OFF);
    }

    @Test
    void outsideTheNodesOrInAFaultPolygonThereIsNoValue() {
        FaultBarriers heave = FaultBarriers.of(List.of(), List.of(SyntheticHorizons.rectangle(400, 400, 420, 420)));
        SurfaceSampler sampler = new SurfaceSampler(stepped, heave);
        assertTrue(Double.isNaN(sampler.valueAt(-1, 500)));
        assertTrue(Double.isNaN(sampler.valueAt(500, 1000.5)));
        assertTrue(Double.isNaN(sampler.valueAt(410, 410)));
        assertEquals(1000, sampler.valueAt(0, 0), ROUND_OFF);
    }
}
