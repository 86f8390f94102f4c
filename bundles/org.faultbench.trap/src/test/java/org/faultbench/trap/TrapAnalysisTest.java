package org.faultbench.trap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;

import org.faultbench.core.fluid.Buoyancy;
import org.faultbench.core.grid.Barriers;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.PhysicalConstants;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * Leak versus spill on the analytic saddle (crest 1000 m, spill 1080 m) with oil, rho_w - rho_o = 300 kg/m3, and
 * fault-rock thresholds from Bretan, Yielding &amp; Jones 2003, AAPG Bull. 87 (SGR 20 % -> 1.7408 bar, SGR 15 % ->
 * 1.1365 bar at burial &lt; 3 km).
 */
class TrapAnalysisTest {
    private static final LeakCandidate SGR20_AT_1050 = new LeakCandidate("F1", 400, 1050, 1.7408e5);
    private static final LeakCandidate SGR15_AT_1020 = new LeakCandidate("F1", 900, 1020, 1.1365e5);

    private final TrapAnalysis analysis = new TrapAnalysis(new Buoyancy(1050, 750, PhysicalConstants.G));
    private final RegularGrid top = Structures.saddle();
    private final Crest crest = CrestFinder.find(top, GridMask.all(top.geometry()));
    private final SpillPoint spill = new SpillPointFinder().find(top, GridMask.none(top.geometry()), crest);

    @Test
    void caseA_faultHoldsMoreThanTheClosureSoTheTrapSpills() {
        // FWL_leak = 1050 + 59.15 = 1109.15 m > spill 1080 m: spill-controlled, column 80 m (hand calculation)
        TrapResult result = analysis.analyse(crest, spill, List.of(SGR20_AT_1050), OptionalDouble.empty());
        assertEquals(Mechanism.SPILL, result.mechanism());
        assertEquals(1080, result.controllingDepth(), 1e-9);
        assertEquals(80, result.columnHeight(), 1e-9);
        assertEquals(1109.15, result.leak().orElseThrow().freeWaterLevel(), 0.005);
        assertEquals(1000, result.spill().x(), 1e-9);
        assertEquals(Double.POSITIVE_INFINITY, result.topSealDepth());
    }

    @Test
    void caseB_shallowerWeakerFaultPointLeaksFirst() {
        // FWL_leak = 1020 + 113650 / 2943 = 1058.62 m < 1080 m: leak-controlled, column 58.62 m (hand calculation)
        TrapResult result = analysis.analyse(crest, spill, List.of(SGR20_AT_1050, SGR15_AT_1020),
                OptionalDouble.empty());
        assertEquals(Mechanism.LEAK, result.mechanism());
        assertEquals(1058.62, result.controllingDepth(), 0.005);
        assertEquals(58.62, result.columnHeight(), 0.005);
        LeakCandidate where = result.leak().orElseThrow().candidate();
        assertEquals("F1", where.faultId());
        assertEquals(900, where.u());
        assertEquals(1020, where.z());
    }

    @Test
    void weakTopSealControlsWhenItHoldsLess() {
        // top seal 1 bar: 1000 + 100000 / 2943 = 1033.98 m, shallower than leak 1058.62 and spill 1080 (hand calc)
        TrapResult result = analysis.analyse(crest, spill, List.of(SGR20_AT_1050, SGR15_AT_1020),
                OptionalDouble.of(1e5));
        assertEquals(Mechanism.TOP_SEAL, result.mechanism());
        assertEquals(1033.98, result.controllingDepth(), 0.005);
        assertEquals(1033.98, result.topSealDepth(), 0.005);
    }

    @Test
    void columnIsNeverNegative() {
        // an open window above the crest: FWL 990 m, shallower than the crest at 1000 m
        TrapResult result = analysis.analyse(crest, spill, List.of(new LeakCandidate("F3", 0, 990, 0)),
                OptionalDouble.empty());
        assertEquals(Mechanism.LEAK, result.mechanism());
        assertEquals(990, result.controllingDepth());
        assertEquals(0, result.columnHeight());
    }

    @Test
    void barrierLimitedTrapReliesOnLeakOrIsRejected() {
        GeometryFactory jts = new GeometryFactory();
        GridMask ring = Barriers.rasterize(top.geometry(), List.of(jts.createLineString(new Coordinate[] {
            new Coordinate(-510, -510), new Coordinate(510, -510), new Coordinate(510, 510),
            new Coordinate(-510, 510), new Coordinate(-510, -510)})));
        SpillPoint closed = new SpillPointFinder().find(top, ring, crest);
        TrapResult result = analysis.analyse(crest, closed, List.of(SGR20_AT_1050), OptionalDouble.empty());
        assertEquals(Mechanism.LEAK, result.mechanism());
        assertEquals(1109.15, result.controllingDepth(), 0.005);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> analysis.analyse(crest, closed, List.of(), OptionalDouble.empty()));
        assertTrue(e.getMessage().startsWith("nothing limits the column"), e.getMessage());
    }

    @Test
    void badTopSealCapacityIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> analysis.analyse(crest, spill, List.of(), OptionalDouble.of(Double.NaN)));
        assertEquals("top-seal capacity must be a finite number >= 0 Pa, was NaN", e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> analysis.analyse(crest, spill, List.of(), OptionalDouble.of(-1)));
        assertEquals("top-seal capacity must be a finite number >= 0 Pa, was -1.0", e.getMessage());
    }
}
