package org.faultbench.digitize.gridding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.digitize.io.XyzPoint;
import org.junit.jupiter.api.Test;

/** Interpolation from the grid of every second node: bilinear, never across a fault. */
class ProlongationTest {
    private static final int[] PARENTS = new int[4];
    private static final double[] WEIGHTS = new double[4];

    @Test
    void planeIsReproducedWithoutFaults() {
        GridGeometry grid = new GridGeometry(21, 16, 0, 0, 10, 10);
        NodeLinks links = new NodeLinks(grid, FaultBarriers.none());
        LevelLinks fine = LevelLinks.of(new CurvatureLevel(links,
                new NodeData(links, SyntheticHorizons.scattered(SyntheticHorizons.PLANE, 50, 3), FaultBarriers.none()),
                0));
        Prolongation p = new Prolongation(fine);
        // an even node count (16) leaves the last row without a coarse row above it: those nodes extrapolate from
        // the two coarse rows below
        assertEquals(11, p.coarseNx());
        assertEquals(8, p.coarseNy());
        double[] coarse = new double[p.coarseNx() * p.coarseNy()];
        for (int k = 0; k < coarse.length; k++) {
            coarse[k] = plane(2 * (k % p.coarseNx()), 2 * (k / p.coarseNx()));
        }
        double[] interpolated = new double[grid.size()];
        p.interpolateAdd(coarse, interpolated, 0, grid.size());
        for (int k = 0; k < grid.size(); k++) {
            int i = grid.column(k);
            int j = grid.row(k);
            // bilinear interpolation and linear extrapolation are exact for a plane (hand calculation)
            assertEquals(plane(i, j), interpolated[k], 1e-9, "node (" + i + ", " + j + ")");
        }
    }

    private static double plane(int i, int j) {
        return 1500 + 3 * i - 2 * j;
    }

    @Test
    void noNodeTakesAParentAcrossTheFault() {
        CurvatureLevel level = FaultedPatch.equations(0);
        GridGeometry grid = level.geometry();
        Prolongation p = new Prolongation(LevelLinks.of(level));
        int crossingsBlocked = 0;
        for (int k = 0; k < grid.size(); k++) {
            int parents = p.parents(k, PARENTS, WEIGHTS);
            assertEquals(level.isUnknown(k) ? parents > 0 : false, parents > 0, "node " + k);
            double weightSum = 0;
            double x = grid.x(grid.column(k));
            double y = grid.y(grid.row(k));
            for (int m = 0; m < parents; m++) {
                double px = grid.x(2 * (PARENTS[m] % p.coarseNx()));
                double py = grid.y(2 * (PARENTS[m] / p.coarseNx()));
                // south of y = 650 m (two cells short of the tip) the trace separates its two sides completely
                if (y <= 650 && py <= 650) {
                    assertEquals(sideOfTrace(x, y), sideOfTrace(px, py),
                            "node " + k + " takes a parent across the fault");
                }
                weightSum += WEIGHTS[m];
            }
            assertEquals(parents > 0 ? 1 : 0, weightSum, 1e-12, "weights of node " + k + " are renormalised");
            crossingsBlocked += parents > 0 && parents < expectedParents(grid.column(k), grid.row(k)) ? 1 : 0;
        }
        // control: the fault does cut some bilinear stencils, so the check above is not empty
        assertTrue(crossingsBlocked > 10, "stencils cut by the fault: " + crossingsBlocked);
    }

    private static boolean sideOfTrace(double x, double y) {
        double[] t = FaultedPatch.TRACE;
        return (t[2] - t[0]) * (y - t[1]) - (t[3] - t[1]) * (x - t[0]) < 0;
    }

    /** Parents of plain bilinear interpolation inside the grid: 1, 2 or 4. */
    /**
     * Beside the fault and the fault polygon, nodes that lose corners extrapolate from the corners they keep: a plane
     * is still reproduced there (linear extrapolation is exact for a plane; hand calculation), except where the fault
     * also cuts the far-side neighbours, next to its tip and the polygon's corners.
     */
    @Test
    void planeIsReproducedBesideTheFault() {
        CurvatureLevel level = FaultedPatch.equations(0);
        GridGeometry grid = level.geometry();
        Prolongation p = new Prolongation(LevelLinks.of(level));
        double[] coarse = new double[p.coarseNx() * p.coarseNy()];
        for (int k = 0; k < coarse.length; k++) {
            coarse[k] = plane(2 * (k % p.coarseNx()), 2 * (k / p.coarseNx()));
        }
        double[] interpolated = new double[grid.size()];
        p.interpolateAdd(coarse, interpolated, 0, grid.size());
        int cut = 0;
        int exact = 0;
        for (int k = 0; k < grid.size(); k++) {
            int i = grid.column(k);
            int j = grid.row(k);
            int parents = p.parents(k, PARENTS, WEIGHTS);
            boolean lostCorners = parents > 0 && !sameParentsAsBilinear(p, i, j, parents);
            if (lostCorners) {
                cut++;
                exact += Math.abs(interpolated[k] - plane(i, j)) < 1e-9 ? 1 : 0;
            } else if (parents > 0) {
                assertEquals(plane(i, j), interpolated[k], 1e-9, "node (" + i + ", " + j + ")");
            }
        }
        assertTrue(cut > 30, "nodes that lose corners to the fault or the polygon: " + cut);
        assertTrue(exact >= 0.9 * cut, "plane reproduced at " + exact + " of " + cut + " nodes that lose corners");
    }

    private static boolean sameParentsAsBilinear(Prolongation p, int i, int j, int parents) {
        if (parents != expectedParents(i, j)) {
            return false;
        }
        for (int m = 0; m < parents; m++) {
            int ci = PARENTS[m] % p.coarseNx();
            int cj = PARENTS[m] / p.coarseNx();
            if (Math.abs(2 * ci - i) > 1 || Math.abs(2 * cj - j) > 1 || WEIGHTS[m] != 1.0 / parents) {
                return false;
            }
        }
        return true;
    }

    private static int expectedParents(int i, int j) {
        return (i % 2 == 1 ? 2 : 1) * (j % 2 == 1 ? 2 : 1);
    }

    @Test
    void aClosedLinkIsNeverUsed() {
        // a fault along x = 35 m on a 9 x 5 grid every 10 m, data next to every node: node (3, 2) lies between
        // coarse nodes (1, 1) and (2, 1), and the second one is across the fault
        GridGeometry grid = new GridGeometry(9, 5, 0, 0, 10, 10);
        FaultBarriers wall = FaultBarriers.of(List.of(SyntheticHorizons.line(35, -10, 35, 50)), List.of());
        List<XyzPoint> points = new ArrayList<>();
        for (int k = 0; k < grid.size(); k++) {
            double x = grid.x(grid.column(k)) + 1;
            double y = grid.y(grid.row(k)) + 1;
            points.add(new XyzPoint(x, y, SyntheticHorizons.PLANE.applyAsDouble(x, y)));
        }
        NodeLinks links = new NodeLinks(grid, wall);
        LevelLinks fine = LevelLinks.of(new CurvatureLevel(links, new NodeData(links, points, wall), 0));
        assertTrue(fine.east(2, 2));
        assertFalse(fine.east(3, 2));
        Prolongation p = new Prolongation(fine);
        int parents = p.parents(grid.index(3, 2), PARENTS, WEIGHTS);
        // (1, 1) and its west neighbour (0, 1), extrapolated half a coarse cell east: 1.5 and -0.5
        assertEquals(2, parents);
        assertEquals(1 * p.coarseNx() + 1, PARENTS[0], "node (3, 2) takes coarse node (1, 1)");
        assertEquals(1.5, WEIGHTS[0]);
        assertEquals(1 * p.coarseNx(), PARENTS[1], "and (0, 1), on the same side of the fault");
        assertEquals(-0.5, WEIGHTS[1]);
    }
}
