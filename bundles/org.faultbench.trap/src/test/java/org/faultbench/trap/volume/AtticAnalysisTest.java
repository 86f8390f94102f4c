package org.faultbench.trap.volume;

import org.faultbench.core.column.ReservoirProperties;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.grid.GridMask;
import org.junit.jupiter.api.Test;

/**
 * Attic rule: the contact after depletion is the deeper of the shallowest cross-fault connection and the well's
 * drainage depth, never deeper than the original contact (common practice; Weber &amp; Dronkert 1998, SPE 50669).
 */
class AtticAnalysisTest {
    private static final double INF = Double.POSITIVE_INFINITY;

    @Test
    void contactRisesToTheDeeperOfConnectionAndDrainage() {
        assertEquals(1050, AtticAnalysis.contactAfterDepletion(1100, 1030, 1050), "well drains deeper");
        assertEquals(1060, AtticAnalysis.contactAfterDepletion(1100, 1060, 1040), "connection deeper");
        assertEquals(1100, AtticAnalysis.contactAfterDepletion(1100, 1120, 1150), "capped by the original contact");
        assertEquals(1100, AtticAnalysis.contactAfterDepletion(1100, INF, 1040), "no cross-fault connection");
    }

    @Test
    void coneAtticAbove50mIsOneEighth() {
        // cone z = 1000 + 0.1 r, original contact 1100 m: GRV 1.0472e8 m3; connection 1050 m, well drains to
        // 1020 m -> contact 1050 m, attic 1.3090e7 m3 = 12.5 % (analytic cone, common practice); tolerance 0.01 %
        Volumetrics cone = Volumetrics.columnOnly(VolumetricsTest.cone(), GridMask.all(VolumetricsTest.FINE));
        ReservoirProperties props = new ReservoirProperties(0.7, 0.2, 0.3, 1.2);
        AtticResult r = new AtticAnalysis(cone, props).analyse(1000, 1100, 1050, 1020);
        assertEquals(100, r.originalColumn());
        assertEquals(1050, r.contactAfterDepletion());
        assertEquals(50, r.atticColumn());
        assertEquals(1.0472e8, r.originalGrossRockVolume(), 1e-4 * 1.0472e8);
        assertEquals(1.3090e7, r.atticGrossRockVolume(), 1e-4 * 1.3090e7);
        assertEquals(0.125, r.atticFraction(), 1e-4);
        // oil in place: GRV * 0.7 * 0.2 * 0.7 / 1.2 (common practice); barrels with 1 m3 = 6.2898 bbl
        assertEquals(r.atticGrossRockVolume() * 0.7 * 0.2 * 0.7 / 1.2, r.atticOilInPlace(), 1e-6 * r.atticOilInPlace());
        assertEquals(r.atticOilInPlace() * 6.2898, r.atticOilInPlaceBarrels(), 1e-5 * r.atticOilInPlaceBarrels());
        assertEquals(r.originalOilInPlace() * 6.2898, r.originalOilInPlaceBarrels(),
                1e-5 * r.originalOilInPlaceBarrels());
    }

    @Test
    void drainageAboveTheCrestLeavesNoAttic() {
        Volumetrics cone = Volumetrics.columnOnly(VolumetricsTest.cone(), GridMask.all(VolumetricsTest.FINE));
        AtticResult r = new AtticAnalysis(cone, new ReservoirProperties(0.7, 0.2, 0.3, 1.2))
                .analyse(1000, 1100, 990, 980);
        assertEquals(0, r.atticColumn());
        assertEquals(0, r.atticGrossRockVolume());
        assertEquals(0, r.atticFraction());
    }

    @Test
    void sealedCompartmentKeepsAllItsOil() {
        Volumetrics cone = Volumetrics.columnOnly(VolumetricsTest.cone(), GridMask.all(VolumetricsTest.FINE));
        AtticResult r = new AtticAnalysis(cone, new ReservoirProperties(0.7, 0.2, 0.3, 1.2))
                .analyse(1000, 1100, INF, 1020);
        assertEquals(1, r.atticFraction(), 1e-12);
        assertEquals(100, r.atticColumn());
    }

    @Test
    void badDepthsAreRejected() {
        Volumetrics cone = Volumetrics.columnOnly(VolumetricsTest.cone(), GridMask.all(VolumetricsTest.FINE));
        AtticAnalysis attic = new AtticAnalysis(cone, new ReservoirProperties(0.7, 0.2, 0.3, 1.2));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> attic.analyse(1000, 990, 1050, 1020));
        assertEquals("original contact (990.0 m) lies above the crest (1000.0 m)", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> attic.analyse(1000, 1100, Double.NaN, 1020));
        assertTrue(e.getMessage().startsWith("cross-fault connection depth"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> attic.analyse(Double.NaN, 1100, 1050, 1020));
        assertEquals("crest depth must be a finite number, was NaN", e.getMessage());
    }
}
