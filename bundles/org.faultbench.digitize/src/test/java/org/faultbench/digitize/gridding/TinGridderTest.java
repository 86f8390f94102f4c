package org.faultbench.digitize.gridding;

import static org.faultbench.digitize.gridding.SyntheticHorizons.FAULT_X;
import static org.faultbench.digitize.gridding.SyntheticHorizons.GRID;
import static org.faultbench.digitize.gridding.SyntheticHorizons.PARABOLOID;
import static org.faultbench.digitize.gridding.SyntheticHorizons.PLANE;
import static org.faultbench.digitize.gridding.SyntheticHorizons.STEPPED;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.digitize.io.XyzPoint;
import org.junit.jupiter.api.Test;

/**
 * TIN gridding. Linear interpolation in triangles reproduces any plane exactly ("linear precision" of barycentric
 * coordinates; e.g. de Berg et al. 2008, Computational Geometry, 3rd ed., ch. 9 on terrains; from memory), so
 * planar data are checked to round-off.
 */
class TinGridderTest {
    private static final double ROUND_OFF = 1e-9;

    private static GriddingResult grid(List<XyzPoint> points, List<ContourLine> contours, FaultBarriers barriers) {
        return new TinGridder().grid(new GriddingInput(points, contours, barriers, GRID));
    }

    /** Contours of PLANE: lines 0.08 x - 0.05 y = z - 1500, clipped to run across the square. */
    private static List<ContourLine> planeContours() {
        List<ContourLine> contours = new ArrayList<>();
        for (double z = 1460; z <= 1580; z += 20) {
            // y = (0.08 x + 1500 - z) / 0.05, from x = -100 to x = 1100
            double y1 = (0.08 * -100 + 1500 - z) / 0.05;
            double y2 = (0.08 * 1100 + 1500 - z) / 0.05;
            contours.add(new ContourLine(SyntheticHorizons.line(-100, y1, 1100, y2), z));
        }
        return contours;
    }

    @Test
    void planeFromScatteredPointsIsReproducedExactly() {
        List<XyzPoint> points = new ArrayList<>(SyntheticHorizons.corners(PLANE));
        points.addAll(SyntheticHorizons.scattered(PLANE, 60, 1));
        GriddingResult result = grid(points, List.of(), FaultBarriers.none());
        // hand check: plane z = 1500 + 0.08 x - 0.05 y; linear precision of the TIN (class comment)
        assertEquals(0, SyntheticHorizons.maxError(result.surface(), PLANE, (x, y) -> 1), ROUND_OFF);
        assertEquals(0, SyntheticHorizons.nullCount(result.surface()), "corner points make the TIN cover the grid");
        assertEquals(0, result.residuals().rms(), ROUND_OFF);
        assertEquals(0, result.iterations());
        assertTrue(result.converged());
    }

    @Test
    void planeFromContoursAloneIsReproducedExactly() {
        GriddingResult result = grid(List.of(), planeContours(), FaultBarriers.none());
        // vertices that JTS inserts on contour segments take the contour depth (TinMesh); plane exact as above
        assertEquals(0, SyntheticHorizons.maxError(result.surface(), PLANE, (x, y) -> 1), ROUND_OFF);
        assertTrue(SyntheticHorizons.nullCount(result.surface()) < GRID.size() / 4, "contours span most of the grid");
        assertEquals(7 * 2, result.residuals().residuals().size(), "7 contours of 2 vertices each");
    }

    @Test
    void faultStepIsKeptWithoutSmear() {
        List<XyzPoint> points = new ArrayList<>(SyntheticHorizons.scattered(STEPPED, 150, 2));
        for (double y : new double[] { 0, 1000 }) {
            points.add(new XyzPoint(0, y, STEPPED.applyAsDouble(0, y)));
            points.add(new XyzPoint(1000, y, STEPPED.applyAsDouble(1000, y)));
            points.add(new XyzPoint(500, y, STEPPED.applyAsDouble(500, y)));
            points.add(new XyzPoint(510, y, STEPPED.applyAsDouble(510, y)));
        }
        RegularGrid surface = grid(points, List.of(), SyntheticHorizons.faultTrace()).surface();
        // each node equals its own side's plane: z = 1000 + 0.1 x west, + 50 m east (hand calculation)
        assertEquals(0, SyntheticHorizons.maxError(surface, STEPPED, (x, y) -> 1), ROUND_OFF, "no node mixes sides");
        int besideFault = 0;
        for (int j = 0; j < GRID.ny(); j++) {
            double west = surface.value(50, j);
            double east = surface.value(51, j);
            if (!Double.isNaN(west) && !Double.isNaN(east)) {
                // 50 m throw + 0.1 x 10 m of dip between x = 500 and x = 510: 51 m (hand calculation)
                assertEquals(51, east - west, ROUND_OFF, "row " + j);
                besideFault++;
            }
        }
        assertTrue(besideFault > 90, "nodes next to the fault are extrapolated on their own side, got " + besideFault);
    }

    @Test
    void nodesInFaultPolygonAndOutsideTheDataAreNull() {
        List<XyzPoint> points = SyntheticHorizons.scattered(PLANE, 80, 3).stream()
                .filter(p -> p.x() < 480 || p.x() > 530).filter(p -> p.x() < 900).toList();
        FaultBarriers heave = FaultBarriers.of(List.of(),
                List.of(SyntheticHorizons.rectangle(FAULT_X - 15, -50, FAULT_X + 15, 1050)));
        RegularGrid surface = grid(points, List.of(), heave).surface();
        for (int j = 0; j < GRID.ny(); j++) {
            for (int i = 49; i <= 52; i++) {
                assertTrue(Double.isNaN(surface.value(i, j)), "node (" + i + ", " + j + ") lies in the polygon");
            }
            assertTrue(Double.isNaN(surface.value(100, j)), "x = 1000 m lies east of every data point");
        }
        assertEquals(0, SyntheticHorizons.maxError(surface, PLANE, (x, y) -> 1), ROUND_OFF);
        assertFalse(Double.isNaN(surface.value(47, 50)), "node west of the polygon keeps a value");
    }

    @Test
    void surfaceDoesNotDependOnTheNumberOfParallelBands() {
        GriddingInput input = new GriddingInput(SyntheticHorizons.scattered(PARABOLOID, 400, 5), planeContours(),
                SyntheticHorizons.faultTrace(), GRID);
        double[] serial = new TinGridder().grid(input, 1).surface().values();
        assertTrue(SyntheticHorizons.nullCount(new TinGridder().grid(input, 1).surface()) < GRID.size() / 2);
        for (int bands : new int[] { 2, 3, 8, 101 }) {
            assertArrayEquals(serial, new TinGridder().grid(input, bands).surface().values(), bands + " bands");
        }
    }

    @Test
    void crossingContoursAreRefused() {
        List<ContourLine> crossing = List.of(new ContourLine(SyntheticHorizons.line(0, 0, 1000, 1000), 1500),
                new ContourLine(SyntheticHorizons.line(0, 1000, 1000, 0), 1600));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> grid(List.of(), crossing, FaultBarriers.none()));
        assertTrue(e.getMessage().contains("cross"), e.getMessage());
    }
}
