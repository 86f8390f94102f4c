package org.faultbench.juxtaposition;

import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_RESERVOIR;
import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_SEAL;
import static org.faultbench.juxtaposition.JuxtapositionClass.SEAL_SEAL;
import static org.faultbench.juxtaposition.TestFixtures.OVERBURDEN;
import static org.faultbench.juxtaposition.TestFixtures.SAND_A;
import static org.faultbench.juxtaposition.TestFixtures.SAND_B;
import static org.faultbench.juxtaposition.TestFixtures.SHALE;
import static org.faultbench.juxtaposition.TestFixtures.UNDERBURDEN;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.column.ResolvedColumn;
import org.junit.jupiter.api.Test;

class HungColumnsTest {

    private static final double EPS = 1e-9;

    private record Interval(double top, double base, int footwall, int hangingWall, JuxtapositionClass type) {
    }

    private static List<Interval> juxtapose(HungColumns walls, double footwallCutOff, double hangingWallCutOff) {
        ColumnIntervals out = new ColumnIntervals();
        walls.juxtapose(footwallCutOff, hangingWallCutOff, out);
        List<Interval> intervals = new ArrayList<>();
        for (int n = 0; n < out.count(); n++) {
            intervals.add(new Interval(out.top(n), out.base(n), out.footwallUnit(n), out.hangingWallUnit(n),
                    out.juxtapositionClass(n)));
        }
        return intervals;
    }

    /** Length over which footwall unit i faces hanging-wall unit j, 0 when they never meet. */
    private static double overlap(List<Interval> intervals, int footwall, int hangingWall) {
        return intervals.stream().filter(v -> v.footwall() == footwall && v.hangingWall() == hangingWall)
                .mapToDouble(v -> v.base() - v.top()).sum();
    }

    @Test
    void sixtyMetresOfThrowPutsSandBAgainstSandAOverThirtyMetres() {
        // footwall cut-off 1000 m, hanging wall 1060 m: boundaries 1000/1050/1080/1130 and 1060/1110/1140/1190
        List<Interval> intervals = juxtapose(TestFixtures.sameColumnBothWalls(), 1000, 1060);
        // Allan 1989, AAPG Bull. 73, 803-811 (Allan diagram); window formula common practice; hand calculation
        assertEquals(List.of(
                new Interval(1000, 1050, SAND_A, OVERBURDEN, RESERVOIR_SEAL),
                new Interval(1050, 1060, SHALE, OVERBURDEN, SEAL_SEAL),
                new Interval(1060, 1080, SHALE, SAND_A, RESERVOIR_SEAL),
                new Interval(1080, 1110, SAND_B, SAND_A, RESERVOIR_RESERVOIR),
                new Interval(1110, 1130, SAND_B, SHALE, RESERVOIR_SEAL),
                new Interval(1130, 1140, UNDERBURDEN, SHALE, SEAL_SEAL),
                new Interval(1140, 1190, UNDERBURDEN, SAND_B, RESERVOIR_SEAL)), intervals);
        // FW sand B faces HW sand A over 30 m, footwall s in [80, 110]
        assertEquals(30, overlap(intervals, SAND_B, SAND_A), EPS);
        // FW sand A faces only HW overburden: sealed by juxtaposition
        assertEquals(50, overlap(intervals, SAND_A, OVERBURDEN), EPS);
        assertEquals(0, overlap(intervals, SAND_A, SAND_A) + overlap(intervals, SAND_A, SAND_B), EPS);
    }

    @Test
    void everyUnitPairMatchesTheConstantThrowWindowFormula() {
        // max(0, min(b1, b2 + T) - max(a1, a2 + T)) for FW unit [a1, b1] against HW unit [a2, b2] under throw T
        // (common practice; Allan 1989 for the diagram), for normal and reverse throws
        ResolvedColumn column = TestFixtures.sandShaleSand();
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        for (double t = -200; t <= 200; t += 2.5) {
            List<Interval> intervals = juxtapose(walls, 1000, 1000 + t);
            for (int i = 0; i < column.size(); i++) {
                for (int j = 0; j < column.size(); j++) {
                    double expected = Math.max(0, Math.min(column.base(i), column.base(j) + t)
                            - Math.max(column.top(i), column.top(j) + t));
                    assertEquals(expected, overlap(intervals, i, j), EPS, "FW " + i + " vs HW " + j + ", T = " + t);
                }
            }
            double span = Math.max(130, 130 + t) - Math.min(0, t);
            assertEquals(span, intervals.stream().mapToDouble(v -> v.base() - v.top()).sum(), EPS,
                    "intervals tile the depth span of both columns, T = " + t);
        }
    }

    @Test
    void zeroThrowSelfJuxtaposesEveryUnitOverItsFullThickness() {
        List<Interval> intervals = juxtapose(TestFixtures.sameColumnBothWalls(), 1000, 1000);
        // no offset: each unit faces itself (common practice)
        assertEquals(List.of(
                new Interval(1000, 1050, SAND_A, SAND_A, RESERVOIR_RESERVOIR),
                new Interval(1050, 1080, SHALE, SHALE, SEAL_SEAL),
                new Interval(1080, 1130, SAND_B, SAND_B, RESERVOIR_RESERVOIR)), intervals);
    }

    @Test
    void throwLargerThanTheColumnLeavesNoReservoirAgainstReservoir() {
        List<Interval> intervals = juxtapose(TestFixtures.sameColumnBothWalls(), 1000, 1150);
        // T = 150 m > 130 m column: the footwall column faces only hanging-wall overburden (hand calculation)
        assertEquals(0, intervals.stream().filter(v -> v.type() == RESERVOIR_RESERVOIR).count());
        assertEquals(130, overlap(intervals, SAND_A, OVERBURDEN) + overlap(intervals, SHALE, OVERBURDEN)
                + overlap(intervals, SAND_B, OVERBURDEN), EPS);
    }

    @Test
    void reverseThrowIsHandledSymmetrically() {
        // T = -60 m (hanging wall up): HW s = FW s + 60, so FW sand A [0, 50] meets HW sand B [80, 130] where
        // FW s is in [20, 50], 30 m (hand calculation with the common-practice window formula)
        List<Interval> intervals = juxtapose(TestFixtures.sameColumnBothWalls(), 1000, 940);
        assertEquals(30, overlap(intervals, SAND_A, SAND_B), EPS);
        assertEquals(new Interval(1020, 1050, SAND_A, SAND_B, RESERVOIR_RESERVOIR),
                intervals.stream().filter(v -> v.type() == RESERVOIR_RESERVOIR).findFirst().orElseThrow());
        assertEquals(50, overlap(intervals, SAND_B, UNDERBURDEN), EPS, "FW sand B faces HW underburden");
    }

    @Test
    void columnsHangFromTheTopOfTheReferenceUnit() {
        // reference horizon = top of sand B, 80 m below top sand A: cut-offs 1080 / 1140 place the columns exactly
        // as cut-offs 1000 / 1060 on top sand A
        HungColumns onSandB = new HungColumns(TestFixtures.sandShaleSand(), TestFixtures.sandShaleSand(), SAND_B);
        assertEquals(juxtapose(TestFixtures.sameColumnBothWalls(), 1000, 1060), juxtapose(onSandB, 1080, 1140));
        assertEquals(-80, onSandB.footwall().topBelowReference(SAND_A), EPS);
    }

    @Test
    void eachWallUsesItsOwnColumnAcrossAGrowthFault() {
        // hanging-wall shale thickened to 60 m; both hung from top sand B with 60 m throw there. HW: sand A
        // [1030, 1080], shale [1080, 1140], sand B [1140, 1190]; FW: sand A [1000, 1050], shale [1050, 1080],
        // sand B [1080, 1130] (hand calculation)
        HungColumns growth = new HungColumns(TestFixtures.sandShaleSand(), TestFixtures.column(50, 60, 50), SAND_B);
        List<Interval> intervals = juxtapose(growth, 1080, 1140);
        assertEquals(20, overlap(intervals, SAND_A, SAND_A), EPS, "sand A self-juxtaposed over [1030, 1050]");
        assertEquals(50, overlap(intervals, SAND_B, SHALE), EPS, "FW sand B sealed by the thick HW shale");
        assertEquals(0, overlap(intervals, SAND_B, SAND_A), EPS);
        // the same throw with an unthickened hanging wall would open a 30 m sand B / sand A window
        HungColumns uniform = new HungColumns(TestFixtures.sandShaleSand(), TestFixtures.sandShaleSand(), SAND_B);
        assertEquals(30, overlap(juxtapose(uniform, 1080, 1140), SAND_B, SAND_A), EPS);
    }

    @Test
    void zeroThicknessUnitsProduceNoInterval() {
        HungColumns walls = new HungColumns(TestFixtures.column(50, 0, 50), TestFixtures.column(50, 0, 50), 0);
        List<Interval> intervals = juxtapose(walls, 1000, 1000);
        assertEquals(List.of(
                new Interval(1000, 1050, SAND_A, SAND_A, RESERVOIR_RESERVOIR),
                new Interval(1050, 1100, SAND_B, SAND_B, RESERVOIR_RESERVOIR)), intervals);
    }

    @Test
    void nonFiniteCutOffDepthsAndBadReferenceUnitsAreRejected() {
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        ColumnIntervals out = new ColumnIntervals();
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
                () -> walls.juxtapose(Double.NaN, 1000, out));
        assertEquals("footwall cut-off depth must be a finite number, was NaN", nan.getMessage());
        assertThrows(IllegalArgumentException.class, () -> walls.juxtapose(1000, Double.POSITIVE_INFINITY, out));
        IllegalArgumentException reference = assertThrows(IllegalArgumentException.class,
                () -> new HungColumns(TestFixtures.sandShaleSand(), TestFixtures.sandShaleSand(), 3));
        assertEquals("reference unit index must be in [0, 2] for the footwall column, was 3", reference.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new HungColumns(TestFixtures.sandShaleSand(), null, 0));
    }

    @Test
    void overAndUnderburdenAreNamedAndNonReservoir() {
        HungColumn footwall = TestFixtures.sameColumnBothWalls().footwall();
        assertEquals("overburden", footwall.unitName(OVERBURDEN));
        assertEquals("underburden", footwall.unitName(UNDERBURDEN));
        assertEquals("sand B", footwall.unitName(SAND_B));
        assertFalse(footwall.isReservoir(OVERBURDEN) || footwall.isReservoir(UNDERBURDEN));
        assertEquals(SHALE, footwall.unitAt(50), "a boundary belongs to the unit below it");
        assertEquals(OVERBURDEN, footwall.unitAt(-0.1));
        assertEquals(UNDERBURDEN, footwall.unitAt(130));
    }

    @Test
    void repeatedColumnsAllocateNothingPerInterval() {
        java.lang.management.ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        assumeTrue(threads instanceof com.sun.management.ThreadMXBean);
        com.sun.management.ThreadMXBean allocation = (com.sun.management.ThreadMXBean) threads;
        assumeTrue(allocation.isThreadAllocatedMemorySupported() && allocation.isThreadAllocatedMemoryEnabled());
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        ColumnIntervals out = new ColumnIntervals();
        double checksum = run(walls, out, 20_000);
        long thread = Thread.currentThread().getId();
        long before = allocation.getThreadAllocatedBytes(thread);
        checksum += run(walls, out, 200_000);
        long allocated = allocation.getThreadAllocatedBytes(thread) - before;
        // 200 000 columns of up to 7 intervals: one small object per interval would exceed 20 MB
        assertNotEquals(0, checksum);
        assertEquals(0, allocated, 64 * 1024, "bytes allocated by 200 000 column juxtapositions");
    }

    private static double run(HungColumns walls, ColumnIntervals out, int columns) {
        double sum = 0;
        for (int k = 0; k < columns; k++) {
            walls.juxtapose(1000, 1000 + k % 200, out);
            sum += out.count() + out.top(out.count() - 1);
        }
        return sum;
    }
}
