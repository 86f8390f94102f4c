package org.faultbench.faults;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class FaultPlaneSamplerTest {

    private static final double EPS = 1e-9;

    private static CutOffLine cutOff(Wall wall, double[] u, double[] z) {
        return new CutOffLine("f1", "Top A", wall, u, z);
    }

    @Test
    void columnsSitAtEqualSpacingAlongTheTraceWithThrowHangingWallMinusFootwall() {
        Fault fault = FaultTest.elbowFault();
        FaultPlaneColumns columns = new FaultPlaneSampler(7).sample(fault,
                cutOff(Wall.FOOTWALL, new double[] {0, 700}, new double[] {1000, 1000}),
                cutOff(Wall.HANGING_WALL, new double[] {0, 700}, new double[] {1060, 1060}));
        // 700 m in 7 columns: width 100 m, centres 50, 150, ..., 650 (hand calculation)
        assertEquals(7, columns.count());
        assertEquals(100, columns.width(), EPS);
        assertEquals(50, columns.u(0), EPS);
        assertEquals(650, columns.u(6), EPS);
        // u = 350 lies 50 m up the north-running segment, at (300, 50)
        assertEquals(300, columns.x(3), EPS);
        assertEquals(50, columns.y(3), EPS);
        // throw = hanging-wall minus footwall cut-off depth, positive for a normal fault (common practice)
        assertEquals(60, columns.throwAt(3), EPS);
        assertEquals("Top A", columns.referenceHorizon());
        assertEquals("f1", columns.faultId());
    }

    @Test
    void linearlyTaperedThrowIsReadAtColumnCentres() {
        Fault fault = new Fault("f1", "Straight", FaultTest.line(0, 0, 1000, 0), 60, 180, true);
        // hanging-wall cut-off from 1100 m at u = 0 to 1000 m at u = 1000: T(u) = 100 - 0.1 u (hand calculation)
        FaultPlaneColumns columns = new FaultPlaneSampler(10).sample(fault,
                cutOff(Wall.FOOTWALL, new double[] {0, 1000}, new double[] {1000, 1000}),
                cutOff(Wall.HANGING_WALL, new double[] {0, 1000}, new double[] {1100, 1000}));
        assertArrayEquals(new double[] {95, 85, 75, 65, 55, 45, 35, 25, 15, 5}, columns.throwProfile(), 1e-9);
    }

    @Test
    void onlyTheStretchCoveredByBothCutOffsIsSampled() {
        Fault fault = new Fault("f1", "Straight", FaultTest.line(0, 0, 1000, 0), 60, 180, true);
        FaultPlaneColumns columns = new FaultPlaneSampler(5).sample(fault,
                cutOff(Wall.FOOTWALL, new double[] {0, 600}, new double[] {1000, 1000}),
                cutOff(Wall.HANGING_WALL, new double[] {100, 700}, new double[] {1050, 1050}));
        // overlap [100, 600] in 5 columns of 100 m
        assertEquals(100, columns.width(), EPS);
        assertEquals(150, columns.u(0), EPS);
        assertEquals(550, columns.u(4), EPS);
    }

    @Test
    void cutOffGapsLeaveColumnsWithoutData() {
        Fault fault = new Fault("f1", "Straight", FaultTest.line(0, 0, 1000, 0), 60, 180, true);
        FaultPlaneColumns columns = new FaultPlaneSampler(4).sample(fault,
                cutOff(Wall.FOOTWALL, new double[] {0, 400, 600, 1000}, new double[] {1000, Double.NaN, 1000, 1000}),
                cutOff(Wall.HANGING_WALL, new double[] {0, 1000}, new double[] {1050, 1050}));
        assertFalse(columns.hasData(0), "u = 125 lies next to the station without depth");
        assertFalse(columns.hasData(1));
        assertTrue(columns.hasData(2));
        assertTrue(Double.isNaN(columns.throwAt(0)));
    }

    @Test
    void mismatchedCutOffsAreRejected() {
        Fault fault = new Fault("f1", "Straight", FaultTest.line(0, 0, 1000, 0), 60, 180, true);
        CutOffLine footwall = cutOff(Wall.FOOTWALL, new double[] {0, 400}, new double[] {1000, 1000});
        CutOffLine hangingWall = cutOff(Wall.HANGING_WALL, new double[] {500, 1000}, new double[] {1050, 1050});
        FaultPlaneSampler sampler = new FaultPlaneSampler(4);
        IllegalArgumentException swapped = assertThrows(IllegalArgumentException.class,
                () -> sampler.sample(fault, hangingWall, footwall));
        assertTrue(swapped.getMessage().contains("expected a footwall then a hanging-wall"), swapped.getMessage());
        IllegalArgumentException apart = assertThrows(IllegalArgumentException.class,
                () -> sampler.sample(fault, footwall, hangingWall));
        assertTrue(apart.getMessage().contains("do not overlap"), apart.getMessage());
        CutOffLine otherHorizon = new CutOffLine("f1", "Top B", Wall.HANGING_WALL, new double[] {0, 1000},
                new double[] {1050, 1050});
        IllegalArgumentException horizons = assertThrows(IllegalArgumentException.class,
                () -> sampler.sample(fault, footwall, otherHorizon));
        assertTrue(horizons.getMessage().contains("'Top B'"), horizons.getMessage());
        CutOffLine otherFault = new CutOffLine("f9", "Top A", Wall.HANGING_WALL, new double[] {0, 1000},
                new double[] {1050, 1050});
        assertThrows(IllegalArgumentException.class, () -> sampler.sample(fault, footwall, otherFault));
        assertThrows(IllegalArgumentException.class, () -> new FaultPlaneSampler(0));
    }

    @Test
    void inconsistentColumnArraysAreRejected() {
        double[] one = {0};
        IllegalArgumentException lengths = assertThrows(IllegalArgumentException.class,
                () -> new FaultPlaneColumns("f1", "Top A", 10, new double[] {0, 10}, one, one, one, one));
        assertTrue(lengths.getMessage().contains("arrays differ in length"), lengths.getMessage());
        IllegalArgumentException width = assertThrows(IllegalArgumentException.class,
                () -> new FaultPlaneColumns("f1", "Top A", 0, one, one, one, one, one));
        assertTrue(width.getMessage().contains("column width must be a finite number > 0, was 0.0"),
                width.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new FaultPlaneColumns("f1", "Top A", 10, one, one, one,
                new double[] {Double.NEGATIVE_INFINITY}, one));
    }
}
