package org.faultbench.faults.profile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Wall;
import org.junit.jupiter.api.Test;

class ThrowProfileTest {

    private static final double EPS = 1e-9;

    private static CutOffLine line(String horizon, Wall wall, double[] u, double[] z) {
        return new CutOffLine("f1", horizon, wall, u, z);
    }

    @Test
    void throwIsHangingWallMinusFootwallDepthAtTheStationsOfBothLines() {
        CutOffLine footwall = line("Top A", Wall.FOOTWALL, new double[] {0, 100, 200}, new double[] {1000, 1000, 1010});
        CutOffLine hangingWall = line("Top A", Wall.HANGING_WALL, new double[] {50, 150, 250},
                new double[] {1020, 1060, 1040});
        ThrowProfile profile = new CutOffPair(footwall, hangingWall).throwProfile();
        // hand calculation: overlap [50, 200]; stations 50, 100, 150, 200 from both lines
        assertArrayEquals(new double[] {50, 100, 150, 200}, profile.validU(), EPS);
        // HW 1020, 1040, 1060, 1050 minus FW 1000, 1000, 1005, 1010
        assertArrayEquals(new double[] {20, 40, 55, 40}, profile.validThrows(), EPS);
        assertEquals(47.5, profile.throwAtU(175), EPS, "interpolated between 55 and 40");
        assertEquals(55, profile.maxAbsThrow(), EPS);
        assertTrue(Double.isNaN(profile.throwAtU(20)), "outside the overlap");
    }

    @Test
    void gapsInACutOffLineStayGapsInTheProfile() {
        CutOffLine footwall = line("Top A", Wall.FOOTWALL, new double[] {0, 100, 200, 300, 400},
                new double[] {1000, 1000, Double.NaN, 1000, 1000});
        CutOffLine hangingWall = line("Top A", Wall.HANGING_WALL, new double[] {0, 400}, new double[] {1030, 1030});
        ThrowProfile profile = ThrowProfile.of(new CutOffPair(footwall, hangingWall));
        assertEquals(30, profile.throwAtU(50), EPS);
        assertTrue(Double.isNaN(profile.throwAtU(150)), "next to the station without data");
        assertTrue(Double.isNaN(profile.throwAtU(250)), "next to the station without data");
        assertEquals(30, profile.throwAtU(350), EPS);
        assertTrue(profile.validU().length < profile.size(), "stations in the gap have no throw");
    }

    @Test
    void cutOffsOfDifferentHorizonsOrSwappedWallsAreRejected() {
        CutOffLine top = line("Top A", Wall.FOOTWALL, new double[] {0, 100}, new double[] {1000, 1000});
        CutOffLine base = line("Base A", Wall.HANGING_WALL, new double[] {0, 100}, new double[] {1100, 1100});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new CutOffPair(top, base));
        assertTrue(e.getMessage().contains("Top A") && e.getMessage().contains("Base A"), e.getMessage());
        CutOffLine topHanging = line("Top A", Wall.HANGING_WALL, new double[] {0, 100}, new double[] {1030, 1030});
        assertThrows(IllegalArgumentException.class, () -> new CutOffPair(topHanging, top));
    }

    @Test
    void smoothingDampsNoiseButKeepsTheProfile() {
        int n = 81;
        double[] u = new double[n];
        double[] truth = new double[n];
        double[] noisy = new double[n];
        Random random = new Random(7);
        ThrowProfileModel bell = new BellProfile();
        for (int i = 0; i < n; i++) {
            u[i] = 50.0 * i;
            truth[i] = 100 * bell.value((u[i] - 2000) / 2000);
            noisy[i] = truth[i] + 4 * random.nextGaussian();
        }
        ThrowProfile smoothed = new ThrowProfile("f1", "Top A", u, noisy).smoothed(0.2);
        double rawError = 0;
        double smoothError = 0;
        for (int i = 0; i < n; i++) {
            rawError += Math.pow(noisy[i] - truth[i], 2);
            smoothError += Math.pow(smoothed.throwAt(i) - truth[i], 2);
        }
        // LOESS (Cleveland 1979) averages the noise over ~16 stations: expect well under half the raw misfit
        assertTrue(smoothError < 0.5 * rawError, "smoothed " + smoothError + " vs raw " + rawError);
    }

    @Test
    void stationsMustIncreaseAlongStrike() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ThrowProfile("f1", "Top A", new double[] {0, 100, 100}, new double[] {1, 2, 3}));
        assertTrue(e.getMessage().contains("Top A") && e.getMessage().contains("station 2"), e.getMessage());
    }
}
