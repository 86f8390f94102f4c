package org.faultbench.trap.volume;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.junit.jupiter.api.Test;

/**
 * Gridded volumes against analytic solids. Stated tolerance: 0.01 % relative on a 10 m grid (node-centred sum; the
 * check values themselves are rounded to 5 figures, 2e-5 relative).
 */
class VolumetricsTest {
    private static final double TOLERANCE = 1e-4;
    /** 221 x 221 nodes, 10 m apart, centred on the origin: covers the 1000 m radius of the solids below. */
    static final GridGeometry FINE = new GridGeometry(221, 221, -1100, -1100, 10, 10);

    /** Cone z = 1000 + 0.1 r. */
    static RegularGrid cone() {
        return RegularGrid.sample(FINE, (x, y) -> 1000 + 0.1 * Math.hypot(x, y));
    }

    private static void assertRelative(double expected, double actual, String source) {
        assertEquals(expected, actual, TOLERANCE * expected, source);
    }

    @Test
    void coneAboveAContact100mBelowTheCrest() {
        // GRV = pi h^3 / (3 s^2) = pi 100^3 / (3 0.1^2) = 1.0472e8 m3 (cone volume, analytic, common practice)
        Volumetrics v = Volumetrics.columnOnly(cone(), GridMask.all(FINE));
        assertRelative(1.0472e8, v.grossRockVolume(1100), "analytic cone");
        assertRelative(Math.PI * 1e6 / 0.03, v.grossRockVolume(1100), "analytic cone, unrounded");
    }

    @Test
    void coneAttic50mBelowTheCrest() {
        // (50/100)^3 of the 100 m cone: 1.3090e7 m3 = 12.5 % (analytic, common practice)
        Volumetrics v = Volumetrics.columnOnly(cone(), GridMask.all(FINE));
        assertRelative(1.3090e7, v.grossRockVolumeBetween(1000, 1050), "analytic cone");
        assertEquals(0.125, v.grossRockVolumeBetween(1000, 1050) / v.grossRockVolume(1100), 1e-4);
    }

    @Test
    void paraboloidAboveAContact100mBelowTheCrest() {
        // z = 1000 + 1e-4 r^2, h = 100 m: GRV = pi h^2 / (2 a) = 1.5708e8 m3 (analytic, common practice)
        RegularGrid top = RegularGrid.sample(FINE, (x, y) -> 1000 + 1e-4 * (x * x + y * y));
        assertRelative(1.5708e8, Volumetrics.columnOnly(top, GridMask.all(FINE)).grossRockVolume(1100),
                "analytic paraboloid");
    }

    @Test
    void unitBaseClipsTheRock() {
        // 30 m thick reservoir on the cone, contact 100 m below the crest: the 100 m cone minus the 70 m cone of
        // water-bearing rock under the base, pi (100^3 - 70^3) / (3 0.1^2) = 6.8801e7 m3 (analytic)
        RegularGrid thickness = RegularGrid.sample(FINE, (x, y) -> 30);
        Volumetrics v = Volumetrics.withThickness(cone(), thickness, GridMask.all(FINE));
        assertRelative(6.8801e7, v.grossRockVolume(1100), "analytic cone minus cone");
    }

    @Test
    void flatSlabIsExact() {
        // 2 x 3 nodes of 100 m x 50 m, top 1000 m, 20 m thick: contact 1010 -> 6 * 5000 * 10, contact 1050 -> base
        // clips at 20 m; between 1005 and 1015: 10 m (hand calculation)
        GridGeometry g = new GridGeometry(2, 3, 0, 0, 100, 50);
        Volumetrics v = Volumetrics.withThickness(RegularGrid.sample(g, (x, y) -> 1000),
                RegularGrid.sample(g, (x, y) -> 20), GridMask.all(g));
        assertEquals(3.0e5, v.grossRockVolume(1010), 1e-6);
        assertEquals(6.0e5, v.grossRockVolume(1050), 1e-6);
        assertEquals(3.0e5, v.grossRockVolumeBetween(1005, 1015), 1e-6);
        assertEquals(0, v.grossRockVolume(990));
    }

    @Test
    void maskAndNullNodesLimitTheSum() {
        GridGeometry g = new GridGeometry(2, 2, 0, 0, 10, 10);
        RegularGrid top = new RegularGrid(g, new double[] {1000, Double.NaN, 1000, 1000});
        GridMask mask = GridMask.of(g, new boolean[] {true, true, true, false});
        // nodes 0 and 2 count: 2 * 100 m2 * 10 m (hand calculation)
        assertEquals(2000, Volumetrics.columnOnly(top, mask).grossRockVolume(1010), 1e-9);
    }

    @Test
    void badInputIsRejected() {
        Volumetrics v = Volumetrics.columnOnly(cone(), GridMask.all(FINE));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> v.grossRockVolume(Double.NaN));
        assertEquals("contact depth must be a finite number, was NaN", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> v.grossRockVolumeBetween(1050, 1000));
        assertTrue(e.getMessage().contains("upper depth (1050.0 m) lies below lower depth (1000.0 m)"));
        GridGeometry coarse = new GridGeometry(3, 3, 0, 0, 10, 10);
        e = assertThrows(IllegalArgumentException.class,
                () -> Volumetrics.withThickness(cone(), RegularGrid.sample(coarse, (x, y) -> 1), GridMask.all(FINE)));
        assertTrue(e.getMessage().startsWith("thickness grid lies on other nodes"), e.getMessage());
        RegularGrid negative = RegularGrid.sample(FINE, (x, y) -> x < 0 ? 10 : -1);
        e = assertThrows(IllegalArgumentException.class,
                () -> Volumetrics.withThickness(cone(), negative, GridMask.all(FINE)));
        assertTrue(e.getMessage().contains("thickness at node (110, 0)") && e.getMessage().contains("-1.0"),
                e.getMessage());
    }
}
