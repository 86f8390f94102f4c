package org.faultbench.juxtaposition;

import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_RESERVOIR;
import static org.faultbench.juxtaposition.TestFixtures.SAND_A;
import static org.faultbench.juxtaposition.TestFixtures.SAND_B;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.junit.jupiter.api.Test;

/** {@link HungColumns#juxtaposeReservoirs}: the reservoir/reservoir part of {@link HungColumns#juxtapose}. */
class HungColumnsReservoirsTest {

    private record Interval(double top, double base, int footwall, int hangingWall, JuxtapositionClass type) {
    }

    private static List<Interval> list(ColumnIntervals out) {
        List<Interval> intervals = new ArrayList<>();
        for (int n = 0; n < out.count(); n++) {
            intervals.add(new Interval(out.top(n), out.base(n), out.footwallUnit(n), out.hangingWallUnit(n),
                    out.juxtapositionClass(n)));
        }
        return intervals;
    }

    private static List<Interval> reservoirs(HungColumns walls, double footwall, double hangingWall, double limit) {
        ColumnIntervals out = new ColumnIntervals();
        walls.juxtaposeReservoirs(footwall, hangingWall, limit, out);
        return list(out);
    }

    /** The reference: every interval of juxtapose() that is reservoir against reservoir and starts above the limit. */
    private static List<Interval> filtered(HungColumns walls, double footwall, double hangingWall, double limit) {
        ColumnIntervals out = new ColumnIntervals();
        walls.juxtapose(footwall, hangingWall, out);
        return list(out).stream().filter(v -> v.type() == RESERVOIR_RESERVOIR && v.top() < limit).toList();
    }

    @Test
    void sixtyMetresOfThrowLeaveOneSandOnSandWindow() {
        // boundaries 1000/1050/1080/1130 (footwall) and 1060/1110/1140/1190 (hanging wall): footwall sand B
        // [1080, 1130) meets hanging-wall sand A [1060, 1110) over [1080, 1110) (Allan 1989, AAPG Bull. 73;
        // hand calculation, the case of HungColumnsTest)
        HungColumns walls = TestFixtures.sameColumnBothWalls();
        assertEquals(List.of(new Interval(1080, 1110, SAND_B, SAND_A, RESERVOIR_RESERVOIR)),
                reservoirs(walls, 1000, 1060, Double.POSITIVE_INFINITY));
        assertEquals(List.of(), reservoirs(walls, 1000, 1060, 1080), "a window starting at the limit is left out");
    }

    @Test
    void smallThrowGivesBothSelfJuxtaposedSands() {
        // 10 m throw: sand A [1000, 1050) on sand A [1010, 1060) over [1010, 1050); sand B [1080, 1130) on sand B
        // [1090, 1140) over [1090, 1130) (hand calculation)
        assertEquals(List.of(new Interval(1010, 1050, SAND_A, SAND_A, RESERVOIR_RESERVOIR),
                new Interval(1090, 1130, SAND_B, SAND_B, RESERVOIR_RESERVOIR)),
                reservoirs(TestFixtures.sameColumnBothWalls(), 1000, 1010, Double.POSITIVE_INFINITY));
    }

    @Test
    void sameIntervalsToTheLastBitAsTheFullJuxtaposition() {
        // equivalence check against juxtapose() of this class, on random columns with zero-thickness units, touching
        // boundaries (whole-metre thicknesses and cut-offs), different walls, both throw senses and depth limits
        SplittableRandom random = new SplittableRandom(42);
        int windows = 0;
        for (int trial = 0; trial < 3000; trial++) {
            int units = 1 + random.nextInt(9);
            int reference = random.nextInt(units);
            HungColumns walls = new HungColumns(randomColumn(random, units), randomColumn(random, units), reference);
            double footwall = 1000 + (trial % 2 == 0 ? random.nextInt(60) : random.nextDouble(60));
            double hangingWall = footwall + (trial % 3 == 0 ? random.nextInt(-80, 81) : random.nextDouble(-80, 80));
            double limit = random.nextInt(4) == 0 ? Double.POSITIVE_INFINITY : 950 + random.nextDouble(300);
            List<Interval> expected = filtered(walls, footwall, hangingWall, limit);
            assertEquals(expected, reservoirs(walls, footwall, hangingWall, limit), "trial " + trial);
            windows += expected.size();
        }
        assertTrue(windows > 1000, "the trials meet many sand-on-sand windows: " + windows);
    }

    private static ResolvedColumn randomColumn(SplittableRandom random, int units) {
        List<UnitSlice> slices = new ArrayList<>();
        for (int i = 0; i < units; i++) {
            boolean sand = random.nextInt(3) > 0;
            double thickness = switch (random.nextInt(4)) {
                case 0 -> 0;
                case 1 -> random.nextInt(1, 40);
                default -> random.nextDouble(1, 40);
            };
            slices.add(new UnitSlice("unit " + i, sand ? LithologyClass.RESERVOIR : LithologyClass.SEAL, sand,
                    thickness, sand ? 0.1 : 0.8));
        }
        return new ResolvedColumn(slices);
    }
}
