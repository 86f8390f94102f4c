package org.faultbench.digitize.gridding;

import static org.faultbench.digitize.gridding.SyntheticHorizons.FAULT_X;
import static org.faultbench.digitize.gridding.SyntheticHorizons.GRID;
import static org.faultbench.digitize.gridding.SyntheticHorizons.PARABOLOID;
import static org.faultbench.digitize.gridding.SyntheticHorizons.PLANE;
import static org.faultbench.digitize.gridding.SyntheticHorizons.STEPPED;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.XyzPoint;
import org.junit.jupiter.api.Test;

/**
 * Minimum curvature (Briggs 1974, Geophysics 39, 39-48). Checks: a plane has zero curvature, so it is the exact
 * minimiser; a paraboloid z = a + b r&sup2; is biharmonic (&nabla;&sup4;z = 0, hand calculation), so it solves the
 * interior equations and deviates only where the natural (zero-curvature) edge conditions pull it away; a fault
 * step survives because no stencil crosses the fault.
 */
class MinimumCurvatureGridderTest {
    /** Convergence tolerance 0.1 mm per sweep by default: planes are checked to 1 cm. */
    private static final double PLANE_TOLERANCE = 0.01;
    /** Planar blocks beside faults converge more slowly (natural edge conditions on more sides): checked to 10 cm. */
    private static final double BLOCK_TOLERANCE = 0.1;

    private static GriddingResult grid(List<XyzPoint> points, FaultBarriers barriers) {
        return new MinimumCurvatureGridder().grid(new GriddingInput(points, List.of(), barriers, GRID));
    }

    @Test
    void planeFromOffNodePointsIsReproduced() {
        GriddingResult result = grid(SyntheticHorizons.scattered(PLANE, 200, 4), FaultBarriers.none());
        // plane: zero curvature everywhere, and the Taylor data equation is exact for it (Briggs 1974)
        assertEquals(0, SyntheticHorizons.maxError(result.surface(), PLANE, (x, y) -> 1), PLANE_TOLERANCE);
        assertEquals(0, SyntheticHorizons.nullCount(result.surface()));
        assertEquals(0, result.residuals().rms(), PLANE_TOLERANCE);
        assertTrue(result.converged());
    }

    @Test
    void planeWithTensionIsReproducedToo() {
        MinimumCurvatureSettings tense = new MinimumCurvatureSettings(0.5, 1e-4, 5000, 1.4);
        GriddingResult result = new MinimumCurvatureGridder(tense).grid(
                new GriddingInput(SyntheticHorizons.scattered(PLANE, 200, 5), List.of(), FaultBarriers.none(), GRID));
        // the tension term (first differences, Smith & Wessel 1990; from memory) also vanishes for a plane
        assertEquals(0, SyntheticHorizons.maxError(result.surface(), PLANE, (x, y) -> 1), PLANE_TOLERANCE);
    }

    @Test
    void paraboloidIsReproducedInsideTheData() {
        GriddingResult result = grid(SyntheticHorizons.scattered(PARABOLOID, 400, 6), FaultBarriers.none());
        // surface spans 1200-1300 m; within 400 m of the crest (well inside the data) the grid is within 0.1 m,
        // near the edges the zero-curvature edge condition of Briggs 1974 bends it, here by less than 2 m
        double inner = SyntheticHorizons.maxError(result.surface(), PARABOLOID,
                (x, y) -> Math.hypot(x - 500, y - 500) < 400 ? 1 : 0);
        double everywhere = SyntheticHorizons.maxError(result.surface(), PARABOLOID, (x, y) -> 1);
        assertTrue(inner < 0.1, "inner error " + inner);
        assertTrue(everywhere < 2, "edge error " + everywhere);
        assertTrue(result.residuals().rms() < 0.1, "rms at the data " + result.residuals().rms());
    }

    @Test
    void clusteredOffNodeDataKeepTheIterationStable() {
        // regression: with a second-order Taylor data equation this data set (java.util.Random seed 1, so the same
        // on every JVM) made the 26 x 26 coarse level diverge, where nearly every node holds a point
        GridGeometry grid = new GridGeometry(200, 200, 0, 0, 10, 10);
        Random random = new Random(1);
        List<XyzPoint> points = new ArrayList<>();
        for (int k = 0; k < 500; k++) {
            double x = 1990 * random.nextDouble();
            double y = 1990 * random.nextDouble();
            points.add(new XyzPoint(x, y, 1500 + 0.02 * x + 2.5e-6 * ((x - 995) * (x - 995) + (y - 995) * (y - 995))));
        }
        GriddingResult result = new MinimumCurvatureGridder()
                .grid(new GriddingInput(points, List.of(), FaultBarriers.none(), grid));
        assertTrue(result.converged());
        assertTrue(result.residuals().rms() < PLANE_TOLERANCE, "rms at the data " + result.residuals().rms());
    }

    @Test
    void faultStepIsKeptWithoutSmear() {
        RegularGrid surface = grid(SyntheticHorizons.scattered(STEPPED, 300, 7), SyntheticHorizons.faultTrace())
                .surface();
        for (int j = 0; j < GRID.ny(); j++) {
            // nodes one cell either side of the trace: 50 m throw + 1 m of dip over 10 m (hand calculation)
            assertEquals(51, surface.value(51, j) - surface.value(50, j), BLOCK_TOLERANCE, "row " + j);
        }
        // each side stays on its own plane: no smear of the step into either block
        assertEquals(0, SyntheticHorizons.maxError(surface, STEPPED, (x, y) -> 1), BLOCK_TOLERANCE);
    }

    @Test
    void faultStepIsSmearedWithoutTheBarrier() {
        RegularGrid surface = grid(SyntheticHorizons.scattered(STEPPED, 300, 7), FaultBarriers.none()).surface();
        // control for the test above: the same data gridded without the fault cannot keep a sharp 51 m step
        assertTrue(surface.value(51, 50) - surface.value(50, 50) < 40);
    }

    @Test
    void faultPolygonNodesAndBlocksWithoutDataAreNull() {
        // heave polygon 490-520 m; a second fault at x = 905 m closes off a block with no data east of it
        List<XyzPoint> points = SyntheticHorizons.scattered(STEPPED, 300, 8).stream()
                .filter(p -> p.x() < 490 || (p.x() > 520 && p.x() < 900)).toList();
        FaultBarriers barriers = FaultBarriers.of(List.of(SyntheticHorizons.line(905, -50, 905, 1050)),
                List.of(SyntheticHorizons.rectangle(FAULT_X - 15, -50, FAULT_X + 15, 1050)));
        RegularGrid surface = grid(points, barriers).surface();
        for (int j = 0; j < GRID.ny(); j++) {
            assertTrue(Double.isNaN(surface.value(50, j)) && Double.isNaN(surface.value(51, j)), "row " + j);
            assertTrue(Double.isNaN(surface.value(95, j)), "block east of x = 905 m has no data");
            // x = 530 m (east, +50 m) minus x = 480 m: 50 + 0.1 x 50 = 55 m (hand calculation)
            assertEquals(55, surface.value(53, j) - surface.value(48, j), BLOCK_TOLERANCE, "row " + j);
        }
        assertEquals(0, SyntheticHorizons.maxError(surface, STEPPED, (x, y) -> 1), BLOCK_TOLERANCE);
    }

    @Test
    void wellTopResidualsAreReported() {
        GriddingResult result = grid(SyntheticHorizons.scattered(PLANE, 200, 9), FaultBarriers.none());
        var tops = List.of(new org.faultbench.digitize.io.WellTop("Well A", "Top Sand", 250, 250, 1512, Double.NaN));
        ResidualReport report = ResidualReport.atWellTops(result.surface(), FaultBarriers.none(), tops);
        // plane at (250, 250): 1500 + 20 - 12.5 = 1507.5 m; top picked at 1512 m: residual -4.5 m (hand calculation)
        assertEquals(-4.5, report.residuals().get(0).residual(), PLANE_TOLERANCE);
        assertEquals("Well A / Top Sand", report.residuals().get(0).point().label());
        assertEquals(4.5, report.rms(), PLANE_TOLERANCE);
    }

    @Test
    void contoursAreUsedAsData() {
        List<ContourLine> contours = new ArrayList<>();
        for (double y = 0; y <= 1000; y += 100) {
            // PLANE along y = const is z = 1500 + 0.08 x - 0.05 y: these are not contours but depth profiles, so
            // use east-west contours of a north-dipping plane z = 1000 + 0.1 y instead
            contours.add(new ContourLine(SyntheticHorizons.line(-20, y, 1020, y), 1000 + 0.1 * y));
        }
        GriddingResult result = new MinimumCurvatureGridder().grid(
                new GriddingInput(List.of(), contours, FaultBarriers.none(), GRID));
        assertEquals(0, SyntheticHorizons.maxError(result.surface(), (x, y) -> 1000 + 0.1 * y, (x, y) -> 1),
                PLANE_TOLERANCE);
    }

    @Test
    void dataOffTheGridAreRefused() {
        List<XyzPoint> far = List.of(new XyzPoint(50_000, 50_000, 1000));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> grid(far, FaultBarriers.none()));
        assertTrue(e.getMessage().contains("no control point"), e.getMessage());
    }

    @Test
    void coarseLevelsCoverTheFineGrid() {
        GridGeometry fine = new GridGeometry(103, 40, 0, 0, 10, 20);
        int step = MinimumCurvatureGridder.coarsestStep(fine);
        // 39 intervals along y allow halving twice before fewer than 8 intervals remain: step 4
        assertEquals(4, step);
        GridGeometry coarse = MinimumCurvatureGridder.coarsened(fine, step);
        assertTrue(coarse.x(coarse.nx() - 1) >= fine.x(fine.nx() - 1));
        assertTrue(coarse.y(coarse.ny() - 1) >= fine.y(fine.ny() - 1));
        assertEquals(coarse.x(coarse.nx() - 2) < fine.x(fine.nx() - 1), true);
        assertFalse(coarse.nx() > (fine.nx() - 2) / step + 2);
    }

    @Test
    void settingsAreChecked() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new MinimumCurvatureSettings(1, 0.001, 10, 1.4));
        assertEquals("tension must be in [0, 1), was 1.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new MinimumCurvatureSettings(0, 0, 10, 1.4));
        assertThrows(IllegalArgumentException.class, () -> new MinimumCurvatureSettings(0, 0.001, 0, 1.4));
        assertThrows(IllegalArgumentException.class, () -> new MinimumCurvatureSettings(0, 0.001, 10, 2));
    }
}
