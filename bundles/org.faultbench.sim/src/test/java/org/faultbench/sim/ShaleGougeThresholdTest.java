package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.juxtaposition.ColumnIntervals;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.seal.BretanCapacity;
import org.faultbench.seal.SgrPressureModel;
import org.faultbench.seal.SgrPressurePoint;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.TabulatedSgrPressure;
import org.junit.jupiter.api.Test;

/** The SGR fast path against {@link ShaleGougeRatioCriterion} itself, which it must equal bit for bit. */
class ShaleGougeThresholdTest {
    private static final SgrPressureModel TABLE = new TabulatedSgrPressure(List.of(new SgrPressurePoint(0, 0),
            new SgrPressurePoint(20, 1e5), new SgrPressurePoint(70, 30e5)));

    private static PointThreshold[] fastAndGeneric(SgrPressureModel model, double burialDepth) {
        SealSetup seal = new SealSetup(new ShaleGougeRatioCriterion(model), burialDepth, UncertainValue.fixed(0), 1);
        return new PointThreshold[] { PointThreshold.of(seal), new CriterionThreshold(seal) };
    }

    @Test
    void sandAgainstSandAcrossAShaleGivesTheBretanPressure() {
        // footwall sand B at s = 100 m faces hanging-wall sand A at 40 m: window [40, 100] holds 10 m of sand A
        // (Vcl 0.1), 30 m shale (0.9) and 20 m sand B (0.1): SGR = 100 (1 + 27 + 2) / 60 = 50 % (Yielding, Freeman &
        // Needham 1997, AAPG Bull. 81; hand calculation); at 2 km burial 10^(50/27 - 0.5) = 22.48 bar (Bretan,
        // Yielding & Jones 2003, AAPG Bull. 87; hand calculation)
        PointThreshold fast = fastAndGeneric(new BretanCapacity(), 2000)[0];
        fast.useColumn(column(sand(50, 0.1), shale(30, 0.9), sand(50, 0.1)));
        fast.moveTo(1100, 60, 100);
        double exact = fast.exact();
        assertEquals(22.48e5, exact, 0.005e5);
        assertTrue(fast.lowerBound() <= exact && exact <= fast.upperBound());
    }

    @Test
    void exactPressureIsTheCriterionsToTheLastBit() {
        // equivalence check (no external value): random columns with zero-thickness units and whole-metre boundaries,
        // points inside, on the edge of and outside the column, no throw, sand on sand and sand on shale
        for (SgrPressureModel model : new SgrPressureModel[] { new BretanCapacity(), TABLE }) {
            PointThreshold[] thresholds = fastAndGeneric(model, 3200);
            SplittableRandom random = new SplittableRandom(7);
            int faultRock = 0;
            for (int trial = 0; trial < 20_000; trial++) {
                if (trial % 50 == 0) {
                    ResolvedColumn column = randomColumn(random);
                    for (PointThreshold threshold : thresholds) {
                        threshold.useColumn(column);
                    }
                }
                double position = random.nextInt(3) == 0 ? random.nextInt(-5, 200) : random.nextDouble(-5, 200);
                double faultThrow = switch (random.nextInt(5)) {
                    case 0 -> 0;
                    case 1 -> random.nextInt(1, 80);
                    default -> random.nextDouble(0, 80);
                };
                faultRock += assertSame(thresholds[0], thresholds[1], 1000 + position, faultThrow, position);
            }
            assertTrue(faultRock > 2000, "many points are rated on fault rock: " + faultRock);
        }
    }

    /** Returns 1 when the point is sand on sand with a finite threshold. */
    private static int assertSame(PointThreshold fast, PointThreshold generic, double depth, double faultThrow,
            double position) {
        String where = "T " + faultThrow + ", s " + position;
        IllegalArgumentException expected = null;
        try {
            generic.moveTo(depth, faultThrow, position);
        } catch (IllegalArgumentException e) {
            expected = e;
        }
        if (expected != null) {
            String message = expected.getMessage();
            assertEquals(message, assertThrows(IllegalArgumentException.class,
                    () -> fast.moveTo(depth, faultThrow, position), where).getMessage(), where);
            return 0;
        }
        fast.moveTo(depth, faultThrow, position);
        double exact = generic.exact();
        assertTrue(fast.lowerBound() <= exact && exact <= fast.upperBound(), where);
        assertEquals(Double.doubleToLongBits(exact), Double.doubleToLongBits(fast.exact()), where);
        return Double.isFinite(exact) && faultThrow > 0 ? 1 : 0;
    }

    @Test
    void windowBoundHoldsAtEveryPointOfASandOnSandWindow() {
        PointThreshold fast = fastAndGeneric(new BretanCapacity(), 2000)[0];
        SplittableRandom random = new SplittableRandom(11);
        ColumnIntervals intervals = new ColumnIntervals();
        int points = 0;
        for (int trial = 0; trial < 2000; trial++) {
            ResolvedColumn column = randomColumn(random);
            fast.useColumn(column);
            double footwall = 1000 + random.nextDouble(10);
            double faultThrow = random.nextDouble(0.001, 90);
            new HungColumns(column, column, 0).juxtaposeReservoirs(footwall, footwall + faultThrow,
                    Double.POSITIVE_INFINITY, intervals);
            double shift = column.top(0) - footwall; // stratigraphic position minus depth on the footwall
            for (int n = 0; n < intervals.count(); n++) {
                double top = intervals.top(n) + 1e-6;
                double base = intervals.base(n);
                double bound = fast.lowerBoundAlong(faultThrow, top + shift, base + shift,
                        intervals.hangingWallUnit(n), intervals.footwallUnit(n));
                for (int i = 0; i <= 20; i++) {
                    double z = i == 20 ? Math.nextDown(base) : top + (base - top) * i / 20;
                    fast.moveTo(z, faultThrow, z + shift);
                    assertTrue(bound <= fast.exact(), "trial " + trial + ": " + bound + " > " + fast.exact());
                    points++;
                }
            }
        }
        assertTrue(points > 10_000, "windows met: " + points / 21);
    }

    @Test
    void otherModelsAreEvaluatedExactlyWithoutBounds() {
        PointThreshold fast = fastAndGeneric(TABLE, 2000)[0];
        fast.useColumn(column(sand(50, 0.1), shale(30, 0.9), sand(50, 0.1)));
        fast.moveTo(1100, 60, 100);
        // SGR 50 % on the table: 1 bar + (50 - 20) / 50 x 29 bar = 18.4 bar (linear interpolation; hand calculation)
        assertEquals(18.4e5, fast.exact(), 1e-6);
        assertEquals(fast.exact(), fast.lowerBound());
        assertEquals(fast.exact(), fast.upperBound());
        assertEquals(0, fast.lowerBoundAlong(60, 90, 110, 0, 2));
    }

    private static ResolvedColumn randomColumn(SplittableRandom random) {
        List<UnitSlice> units = new ArrayList<>();
        int count = 3 + random.nextInt(10);
        for (int i = 0; i < count; i++) {
            double thickness = switch (random.nextInt(5)) {
                case 0 -> 0;
                case 1, 2 -> random.nextInt(1, 30);
                default -> random.nextDouble(0.5, 30);
            };
            units.add(random.nextInt(3) > 0 ? sand(thickness, random.nextDouble(0, 0.35))
                    : shale(thickness, random.nextDouble(0.4, 1)));
        }
        return column(units.toArray(UnitSlice[]::new));
    }

    private static UnitSlice sand(double thickness, double clay) {
        return new UnitSlice("unit", LithologyClass.RESERVOIR, true, thickness, clay);
    }

    private static UnitSlice shale(double thickness, double clay) {
        return new UnitSlice("unit", LithologyClass.SEAL, false, thickness, clay);
    }

    private static ResolvedColumn column(UnitSlice... units) {
        List<UnitSlice> named = new ArrayList<>();
        for (int i = 0; i < units.length; i++) {
            UnitSlice u = units[i];
            named.add(new UnitSlice("unit " + i, u.lithology(), u.reservoir(), u.thickness(), u.clayFraction()));
        }
        return new ResolvedColumn(named);
    }
}
