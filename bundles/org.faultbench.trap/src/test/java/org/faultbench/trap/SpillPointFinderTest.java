package org.faultbench.trap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.grid.Barriers;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

class SpillPointFinderTest {
    private static final double NULL = Double.NaN;
    private static final GeometryFactory JTS = new GeometryFactory();
    private static final GridGeometry SMALL = new GridGeometry(5, 5, 0, 0, 100, 100);

    /**
     * Hand-made 5 x 5 dome, printed north (j = 4) to south (j = 0). Crest (2,2) at 1000 m. The only edge node
     * shallower than 1100 m is (2,0) at 1020 m, reached through (2,1) at 1055 m.
     */
    private static double[] smallDome() {
        double[][] rowsNorthToSouth = {
            {1100, 1100, 1100, 1100, 1100},
            {1100, 1030, 1040, 1020, 1100},
            {1100, 1050, 1000, 1060, 1100},
            {1100, 1045, 1055, 1070, 1100},
            {1100, 1100, 1020, 1100, 1100}};
        double[] values = new double[25];
        for (int r = 0; r < 5; r++) {
            System.arraycopy(rowsNorthToSouth[r], 0, values, (4 - r) * 5, 5);
        }
        return values;
    }

    private static Crest smallCrest() {
        return new Crest(2, 2, 200, 200, 1000);
    }

    private static LineString trace(double... xy) {
        Coordinate[] c = new Coordinate[xy.length / 2];
        for (int k = 0; k < c.length; k++) {
            c[k] = new Coordinate(xy[2 * k], xy[2 * k + 1]);
        }
        return JTS.createLineString(c);
    }

    @Test
    void handMadeDomeSpillsAtTheSaddleOnTheMinimaxPath() {
        // Minimax path from the crest to the edge: (2,2) 1000 -> (2,1) 1055 -> (2,0) 1020, so the spill depth is
        // 1055 m at node (2,1); nodes above 1055 m joined to the crest: (2,2), (1,2) 1050, (2,3) 1040, (1,3) 1030,
        // (3,3) 1020, (1,1) 1045 (priority-flood, Barnes, Lehman & Mulla 2014, Comput. Geosci. 62; hand calculation)
        RegularGrid top = new RegularGrid(SMALL, smallDome());
        SpillPoint spill = new SpillPointFinder().find(top, GridMask.none(SMALL), smallCrest());
        assertEquals(1055, spill.depth(), 1e-12);
        assertEquals(200, spill.x(), 1e-12);
        assertEquals(100, spill.y(), 1e-12);
        assertFalse(spill.atDataEdge());
        assertEquals(SpillPoint.Source.COMPUTED, spill.source());
        assertEquals(6, spill.trapped().count());
        for (int[] n : new int[][] {{2, 2}, {1, 2}, {2, 3}, {1, 3}, {3, 3}, {1, 1}}) {
            assertTrue(spill.trapped().contains(n[0], n[1]), n[0] + "," + n[1]);
        }
    }

    @Test
    void eightConnectedFloodAlsoStepsAcrossCorners() {
        // With diagonal steps (1,1) 1045 -> (2,0) 1020 is allowed: spill 1045 m at (1,1); above it (2,2), (2,3),
        // (1,3), (3,3); hand calculation
        RegularGrid top = new RegularGrid(SMALL, smallDome());
        SpillPoint spill = new SpillPointFinder(Connectivity.EIGHT).find(top, GridMask.none(SMALL), smallCrest());
        assertEquals(1045, spill.depth(), 1e-12);
        assertEquals(100, spill.x(), 1e-12);
        assertEquals(100, spill.y(), 1e-12);
        assertEquals(4, spill.trapped().count());
    }

    @Test
    void nullNodesAreOutside() {
        // (1,3) null: (2,3) at 1040 m touches it, so the dome spills there (hand calculation)
        double[] values = smallDome();
        values[3 * 5 + 1] = NULL;
        SpillPoint spill = new SpillPointFinder().find(new RegularGrid(SMALL, values), GridMask.none(SMALL),
                smallCrest());
        assertEquals(1040, spill.depth(), 1e-12);
        assertEquals(300, spill.y(), 1e-12);
        assertTrue(spill.atDataEdge());
        assertEquals(1, spill.trapped().count());
    }

    @Test
    void analyticSaddleSpillsAt1080m() {
        // Cone-and-ramp surface of Structures.saddle(): spill 1080 m at (1000, 0); the trapped nodes are exactly
        // those with r < 1000 m, where the cone is shallower than 1080 m (hand calculation)
        RegularGrid top = Structures.saddle();
        SpillPoint spill = new SpillPointFinder().find(top, GridMask.none(top.geometry()), Structures.saddleCrest());
        assertEquals(1080, spill.depth(), 1e-9);
        assertEquals(1000, spill.x(), 1e-9);
        assertEquals(0, spill.y(), 1e-9);
        assertFalse(spill.atDataEdge());
        int inside = 0;
        for (int k = 0; k < top.geometry().size(); k++) {
            double r = Math.hypot(top.x(top.geometry().column(k)), top.y(top.geometry().row(k)));
            assertEquals(r < 1000 - 1e-9, spill.trapped().contains(k), "node " + k);
            inside += r < 1000 - 1e-9 ? 1 : 0;
        }
        assertEquals(inside, spill.trapped().count());
    }

    @Test
    void faultTraceAcrossTheSaddleRaisesTheSpillDepth() {
        // A north-south sealing fault at x = 910 m (barrier column x = 900 m) cuts the saddle off. The shallowest way
        // out is then along x = 850 m to the north or south edge, where the ramp gives
        // 1080 + 0.08 * 150 + 1e-5 * 1500^2 = 1114.5 m (hand calculation)
        RegularGrid top = Structures.saddle();
        GridMask fault = Barriers.rasterize(top.geometry(), List.of(trace(910, -2000, 910, 2000)));
        SpillPoint spill = new SpillPointFinder().find(top, fault, Structures.saddleCrest());
        assertEquals(1114.5, spill.depth(), 1e-9);
        assertEquals(850, spill.x(), 1e-9);
        assertEquals(1500, Math.abs(spill.y()), 1e-9);
        assertTrue(spill.atDataEdge(), "spills where the map ends");
    }

    @Test
    void structureClosedByBarriersIsBarrierLimited() {
        // A square fault ring through the node columns and rows at +-500 m leaves 19 x 19 nodes inside
        RegularGrid top = Structures.saddle();
        GridMask ring = Barriers.rasterize(top.geometry(),
                List.of(trace(-510, -510, 510, -510, 510, 510, -510, 510, -510, -510)));
        SpillPoint spill = new SpillPointFinder().find(top, ring, Structures.saddleCrest());
        assertTrue(spill.isBarrierLimited());
        assertEquals(Double.POSITIVE_INFINITY, spill.depth());
        assertTrue(Double.isNaN(spill.x()));
        assertEquals(19 * 19, spill.trapped().count());
    }

    @Test
    void closureAtTheSpillDepthIsTheTrappedArea() {
        RegularGrid top = Structures.saddle();
        GridMask none = GridMask.none(top.geometry());
        SpillPoint spill = new SpillPointFinder().find(top, none, Structures.saddleCrest());
        GridMask closure = Closure.connectedAbove(top, none, Structures.saddleCrest(), 1080, Connectivity.FOUR);
        assertEquals(spill.trapped().count(), closure.count());
        for (int k = 0; k < top.geometry().size(); k++) {
            assertEquals(spill.trapped().contains(k), closure.contains(k));
        }
    }

    @Test
    void userSpillDepthFloodsTheUserCompartment() {
        // Above 1050 m and joined to the crest: (2,2), (2,3) 1040, (1,3) 1030, (3,3) 1020; (1,1) at 1045 m is cut
        // off by (1,2) 1050 and (2,1) 1055 (hand calculation)
        RegularGrid top = new RegularGrid(SMALL, smallDome());
        SpillPoint spill = new SpillPointFinder().userDefined(top, GridMask.all(SMALL), smallCrest(), 1050);
        assertEquals(SpillPoint.Source.USER, spill.source());
        assertEquals(1050, spill.depth());
        assertTrue(Double.isNaN(spill.x()) && Double.isNaN(spill.y()));
        assertEquals(4, spill.trapped().count());
        assertFalse(spill.trapped().contains(1, 1));
        boolean[] compartment = new boolean[25];
        compartment[SMALL.index(2, 2)] = true;
        compartment[SMALL.index(2, 3)] = true;
        SpillPoint restricted = new SpillPointFinder().userDefined(top, GridMask.of(SMALL, compartment),
                smallCrest(), 1050);
        assertEquals(2, restricted.trapped().count(), "the user's compartment bounds the flood");
    }

    @Test
    void badInputIsRejectedWithClearMessages() {
        RegularGrid top = new RegularGrid(SMALL, smallDome());
        SpillPointFinder finder = new SpillPointFinder();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> finder.userDefined(top, GridMask.all(SMALL), smallCrest(), 990));
        assertTrue(e.getMessage().contains("crest (1000.0 m), was 990.0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> finder.userDefined(top, GridMask.all(SMALL), smallCrest(), Double.NaN));
        assertTrue(e.getMessage().contains("was NaN"), e.getMessage());
        GridMask onCrest = Barriers.rasterize(SMALL, List.of(trace(150, 200, 250, 200)));
        e = assertThrows(IllegalArgumentException.class, () -> finder.find(top, onCrest, smallCrest()));
        assertEquals("crest node (2, 2) is a barrier node", e.getMessage());
        GridMask otherGrid = GridMask.none(new GridGeometry(5, 6, 0, 0, 100, 100));
        e = assertThrows(IllegalArgumentException.class, () -> finder.find(top, otherGrid, smallCrest()));
        assertTrue(e.getMessage().startsWith("barrier mask lies on other nodes"), e.getMessage());
        double[] values = smallDome();
        values[12] = NULL;
        e = assertThrows(IllegalArgumentException.class,
                () -> finder.find(new RegularGrid(SMALL, values), GridMask.none(SMALL), smallCrest()));
        assertTrue(e.getMessage().contains("null node"), e.getMessage());
    }
}
