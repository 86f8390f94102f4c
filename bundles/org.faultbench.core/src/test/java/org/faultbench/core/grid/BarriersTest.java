package org.faultbench.core.grid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

class BarriersTest {
    private static final GeometryFactory JTS = new GeometryFactory();
    /** Cells of 10 m: node (i, j) at (10 i, 10 j), cell [10 i - 5, 10 i + 5] x [10 j - 5, 10 j + 5]. */
    private final GridGeometry g = new GridGeometry(10, 10, 0, 0, 10, 10);

    private static LineString trace(double... xy) {
        Coordinate[] c = new Coordinate[xy.length / 2];
        for (int k = 0; k < c.length; k++) {
            c[k] = new Coordinate(xy[2 * k], xy[2 * k + 1]);
        }
        return JTS.createLineString(c);
    }

    @Test
    void marksExactlyTheCellsASegmentPassesThrough() {
        // (2,2) -> (17,8): y = 2 + 0.4 (x - 2) crosses x = 5 at y = 3.2, y = 5 at x = 9.5, x = 15 at y = 7.2,
        // so it passes cells (0,0), (1,0), (1,1), (2,1); hand calculation
        GridMask barrier = Barriers.rasterize(g, List.of(trace(2, 2, 17, 8)));
        assertEquals(4, barrier.count());
        assertTrue(barrier.contains(0, 0) && barrier.contains(1, 0) && barrier.contains(1, 1) && barrier.contains(2, 1));
    }

    @Test
    void horizontalTraceMarksOneRow() {
        GridMask barrier = Barriers.rasterize(g, List.of(trace(-20, 22, 200, 22)));
        assertEquals(10, barrier.count());
        for (int i = 0; i < 10; i++) {
            assertTrue(barrier.contains(i, 2));
        }
    }

    @Test
    void diagonalTraceBlocksFourNeighbourFlow() {
        // Supercover rasterisation marks every cell the line touches (Amanatides & Woo 1987, Eurographics, from
        // memory), so the barrier is a side-connected chain; checked here by flooding both sides
        GridMask none = GridMask.none(g);
        assertTrue(reachable(none, 9, 0, 0, 9, false), "without a barrier the corners connect");
        GridMask barrier = Barriers.rasterize(g, List.of(trace(-5, 3, 95, 71)));
        assertFalse(barrier.contains(9, 0) || barrier.contains(0, 9));
        assertFalse(reachable(barrier, 9, 0, 0, 9, false));
    }

    @Test
    void traceThroughCellCornersBlocksEvenEightNeighbourFlow() {
        // y = x runs through the corners (5 + 10k, 5 + 10k): a thin diagonal chain would let an 8-connected flood
        // step across; touching cells are marked too, and a side-connected barrier separates 8-connected regions
        // (Rosenfeld 1970, J. ACM 17, from memory)
        GridMask barrier = Barriers.rasterize(g, List.of(trace(-5, -5, 95, 95)));
        assertTrue(reachable(GridMask.none(g), 9, 0, 0, 9, true));
        assertFalse(reachable(barrier, 9, 0, 0, 9, true));
        assertTrue(barrier.contains(1, 0) && barrier.contains(0, 1), "corner-touched cells are barriers");
    }

    @Test
    void tracesOffTheGridMarkNothing() {
        assertEquals(0, Barriers.rasterize(g, List.of(trace(200, 0, 300, 500), trace(-100, -100, -50, 400))).count());
    }

    @Test
    void traceWithANonNumberPointIsRejected() {
        LineString bad = trace(0, 0, Double.NaN, 10);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Barriers.rasterize(g, List.of(bad)));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
    }

    /** Breadth-first search over non-barrier nodes. */
    private boolean reachable(GridMask barrier, int i0, int j0, int i1, int j1, boolean eightNeighbours) {
        boolean[] seen = new boolean[g.size()];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(g.index(i0, j0));
        seen[g.index(i0, j0)] = true;
        while (!queue.isEmpty()) {
            int k = queue.poll();
            if (k == g.index(i1, j1)) {
                return true;
            }
            for (int di = -1; di <= 1; di++) {
                for (int dj = -1; dj <= 1; dj++) {
                    boolean diagonal = di != 0 && dj != 0;
                    int i = g.column(k) + di;
                    int j = g.row(k) + dj;
                    if ((di == 0 && dj == 0) || (diagonal && !eightNeighbours) || !g.contains(i, j)) {
                        continue;
                    }
                    int n = g.index(i, j);
                    if (!seen[n] && !barrier.contains(n)) {
                        seen[n] = true;
                        queue.add(n);
                    }
                }
            }
        }
        return false;
    }
}
