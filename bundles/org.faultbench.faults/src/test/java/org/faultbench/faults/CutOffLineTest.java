package org.faultbench.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;

class CutOffLineTest {

    private static final double EPS = 1e-9;

    @Test
    void digitizedPointsAreProjectedOntoTheTraceAndSortedAlongStrike() {
        Fault fault = FaultTest.elbowFault();
        // projections by hand: (100, 30) -> u 100; (325, 200) -> u 500; (50, -10) -> u 50
        CutOffLine line = CutOffLine.fromMapPoints(fault, "Top A", Wall.FOOTWALL, List.of(
                new Coordinate(100, 30, 1010), new Coordinate(325, 200, 1050), new Coordinate(50, -10, 1000)));
        assertEquals(3, line.stationCount());
        assertEquals(50, line.stationU(0), EPS);
        assertEquals(100, line.stationU(1), EPS);
        assertEquals(500, line.stationU(2), EPS);
        assertEquals(1000, line.stationDepth(0), EPS);
        // linear interpolation between u 100 (1010 m) and u 500 (1050 m): 1010 + 40 * 200 / 400 (hand calculation)
        assertEquals(1030, line.depthAt(300), EPS);
        assertEquals(1005, line.depthAt(75), EPS);
        assertEquals(1050, line.depthAt(500), EPS, "the last station is inside the range");
    }

    @Test
    void depthIsNaNOutsideTheDigitizedRange() {
        CutOffLine line = new CutOffLine("f1", "Top A", Wall.HANGING_WALL, new double[] {100, 200},
                new double[] {1000, 1010});
        assertTrue(Double.isNaN(line.depthAt(99.9)));
        assertTrue(Double.isNaN(line.depthAt(200.1)));
        assertTrue(Double.isNaN(line.depthAt(Double.NaN)));
        assertEquals(100, line.minU(), EPS);
        assertEquals(200, line.maxU(), EPS);
    }

    @Test
    void pointsProjectingToTheSameDistanceAreAveraged() {
        Fault fault = FaultTest.elbowFault();
        // (320, -20) and (310, -30) both lie outside the bend and project onto it, u = 300
        CutOffLine line = CutOffLine.fromMapPoints(fault, "Top A", Wall.HANGING_WALL, List.of(
                new Coordinate(320, -20, 1100), new Coordinate(310, -30, 1110), new Coordinate(0, -5, 1090)));
        assertEquals(2, line.stationCount());
        assertEquals(1105, line.depthAt(300), EPS, "mean of 1100 and 1110");
    }

    @Test
    void digitizedPointWithoutDepthIsRejected() {
        Fault fault = FaultTest.elbowFault();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CutOffLine.fromMapPoints(fault, "Top A", Wall.FOOTWALL,
                        List.of(new Coordinate(10, 5, 1000), new Coordinate(60, 5))));
        assertEquals("cut-off of horizon 'Top A' on the footwall of fault 'Elbow': point 1 at (60.0, 5.0) has no valid"
                + " depth (z = NaN)", e.getMessage());
    }

    @Test
    void fewerThanTwoStationsOrUnorderedStationsAreRejected() {
        Fault fault = FaultTest.elbowFault();
        IllegalArgumentException single = assertThrows(IllegalArgumentException.class,
                () -> CutOffLine.fromMapPoints(fault, "Top A", Wall.FOOTWALL, List.of(new Coordinate(10, 5, 1000))));
        assertTrue(single.getMessage().contains("at least two stations"), single.getMessage());
        IllegalArgumentException unordered = assertThrows(IllegalArgumentException.class,
                () -> new CutOffLine("f1", "Top A", Wall.FOOTWALL, new double[] {10, 10}, new double[] {1, 2}));
        assertTrue(unordered.getMessage().contains("increasing u"), unordered.getMessage());
        IllegalArgumentException infinite = assertThrows(IllegalArgumentException.class, () -> new CutOffLine("f1",
                "Top A", Wall.FOOTWALL, new double[] {0, 10}, new double[] {1, Double.POSITIVE_INFINITY}));
        assertTrue(infinite.getMessage().contains("station 1 has depth Infinity"), infinite.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new CutOffLine("f1", "Top A", null, new double[] {0, 10}, new double[] {1, 2}));
    }

    @Test
    void sampledCutOffsReadTheSurfaceOffTheTraceOnEachWall() {
        // trace west to east dipping south; a north-tilted horizon downthrown 80 m on the south (hanging-wall) side,
        // with no data east of x = 850 (hand-built surface)
        Fault fault = new Fault("f3", "Straight", FaultTest.line(0, 0, 1000, 0), 60, 180, true);
        CutOffLine footwall = CutOffLine.sampled(fault, "Top A", Wall.FOOTWALL, FaultCutSurface::depth, 25, 11);
        CutOffLine hangingWall = CutOffLine.sampled(fault, "Top A", Wall.HANGING_WALL, FaultCutSurface::depth, 25, 11);
        // z = 2000 + 0.05 x on the footwall, + 80 m on the hanging wall (hand calculation)
        assertEquals(2025, footwall.depthAt(500), EPS);
        assertEquals(2105, hangingWall.depthAt(500), EPS);
        assertEquals(2019.5, footwall.depthAt(390), EPS, "between stations 300 and 400");
        assertEquals(80, hangingWall.depthAt(123) - footwall.depthAt(123), EPS, "throw");
        assertEquals(2039.5, footwall.depthAt(790), EPS, "station 800 still has data");
        assertTrue(Double.isNaN(footwall.depthAt(850)), "next to station 900, which has none");
        assertEquals(1000, footwall.maxU(), EPS);
    }

    @Test
    void samplingNeedsTwoStations() {
        Fault fault = new Fault("f3", "Straight", FaultTest.line(0, 0, 1000, 0), 60, 180, true);
        assertThrows(IllegalArgumentException.class,
                () -> CutOffLine.sampled(fault, "Top A", Wall.FOOTWALL, FaultCutSurface::depth, 25, 1));
    }

    /** A horizon depth surface cut by an east-west normal fault along y = 0, downthrown to the south. */
    private static final class FaultCutSurface {
        static double depth(double x, double y) {
            if (x > 850) {
                return Double.NaN;
            }
            return 2000 + 0.05 * x + (y < 0 ? 80 : 0);
        }
    }
}
