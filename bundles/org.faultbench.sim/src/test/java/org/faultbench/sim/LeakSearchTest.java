package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.units.PhysicalConstants;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.juxtaposition.ColumnIntervals;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.juxtaposition.JuxtapositionClass;
import org.faultbench.seal.FaultPointContext;
import org.faultbench.seal.JuxtapositionOnlyCriterion;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.SgrPressurePoint;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.ShaleSmearFactorCriterion;
import org.faultbench.seal.TabulatedSgrPressure;
import org.faultbench.strat.StratUnit;
import org.faultbench.strat.Stratigraphy;
import org.junit.jupiter.api.Test;

/**
 * Equivalence checks: the leak search skips columns, windows and points and brackets threshold pressures, and must
 * still give, bit for bit, what the search of the first implementation gave, which juxtaposed every column in full and
 * rated every sample point with the seal criterion itself ({@link ReferenceSearch}, kept here as the reference).
 */
class LeakSearchTest {
    private static final int REALISATIONS = 60;

    @Test
    void shaleGougeRatioWithAtticResidualDepthAndUncertainThrow() {
        assertSameAsReference(richDome(new ShaleGougeRatioCriterion()));
    }

    @Test
    void juxtapositionOnly() {
        assertSameAsReference(richDome(new JuxtapositionOnlyCriterion()));
    }

    @Test
    void shaleGougeRatioOnAManyLayeredColumnWithCalibrationUncertainty() {
        TrapStudy layered = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(),
                UncertainValue.truncatedNormal(1, 0.6, 0, Double.POSITIVE_INFINITY), Optional.empty(), layeredColumn(),
                new DepthUncertainty(UncertainValue.normal(0, 5), 0, 1000), UncertainValue.normal(750, 20),
                UncertainValue.fixed(1050));
        assertSameAsReference(withSeal(layered, new SealSetup(new ShaleGougeRatioCriterion(), 2000,
                UncertainValue.normal(0, 0.3), 1.4)));
    }

    @Test
    void reverseThrowPutsTheCriterionOnTheHangingWall() {
        assertSameAsReference(SingleFaultDome.study(-20, new ShaleGougeRatioCriterion(), UncertainValue.normal(1, 0.3),
                Optional.empty()));
    }

    /**
     * Juxtaposition alone visits windows unit pair by unit pair in throw order: a constant throw makes every column tie
     * in that order, and the cone's cut-offs are symmetric about its axis, so leak points tie in depth too.
     */
    @Test
    void juxtapositionOnlyWithTiedThrowsAndTiedLeakPoints() {
        assertSameAsReference(SingleFaultDome.juxtapositionOnly(20));
        assertSameAsReference(SingleFaultDome.juxtapositionOnly(-20));
        assertSameAsReference(SingleFaultDome.study(20, new JuxtapositionOnlyCriterion(),
                UncertainValue.normal(1, 0.3), Optional.empty()));
    }

    /**
     * Footwall cut-offs all at one depth and a throw shrinking along the fault: Sand B's windows against the hanging
     * wall's Sand A start at its footwall top in every column where they exist, so its leak points tie in depth, and
     * throw order visits those columns against column order. The column-by-column scan keeps the first column.
     */
    @Test
    void juxtapositionOnlyKeepsTheFirstColumnOfTiedLeakPointsAgainstThrowOrder() {
        TrapStudy cone = SingleFaultDome.juxtapositionOnly(20);
        Fault fault = cone.faults().get(0).fault();
        CutOffLine footwall = CutOffLine.sampled(fault, "Sand A", Wall.FOOTWALL, (x, y) -> 1030, 0, 399);
        CutOffLine hangingWall = CutOffLine.sampled(fault, "Sand A", Wall.HANGING_WALL,
                (x, y) -> 1030 + 20 - 0.004 * y, 0, 399);
        TrapStudy tied = new TrapStudy(cone.name(), cone.stratigraphy(), cone.referenceTop(), cone.compartment(),
                List.of(new BoundingFault(fault, footwall, hangingWall, UncertainValue.fixed(1), 399)), cone.fluids(),
                cone.seal(), cone.depthUncertainty(), cone.userSpillDepth(), cone.topSealCapacity(), cone.attic());
        assertSameAsReference(tied);
    }

    /** Many sand-on-sand windows, and sands stacked without a shale between them (windows that touch). */
    @Test
    void juxtapositionOnlyOnManyLayersAndStackedSands() {
        assertSameAsReference(SingleFaultDome.study(20, new JuxtapositionOnlyCriterion(),
                UncertainValue.truncatedNormal(1, 0.6, 0, Double.POSITIVE_INFINITY), Optional.empty(), layeredColumn(),
                new DepthUncertainty(UncertainValue.normal(0, 5), 2, 600), UncertainValue.normal(750, 20),
                UncertainValue.fixed(1050)));
        assertSameAsReference(SingleFaultDome.study(35, new JuxtapositionOnlyCriterion(),
                UncertainValue.uniform(0, 2), Optional.of(new AtticSetup("F1", UncertainValue.uniform(1050, 1070))),
                stackedSands(), DepthUncertainty.NONE, UncertainValue.normal(750, 20), UncertainValue.fixed(1050)));
    }

    @Test
    void otherCriteriaTakeTheGenericPath() {
        assertSameAsReference(richDome(new ShaleSmearFactorCriterion()));
        assertSameAsReference(richDome(new ShaleGougeRatioCriterion(new TabulatedSgrPressure(List.of(
                new SgrPressurePoint(0, 0), new SgrPressurePoint(15, 0.5e5), new SgrPressurePoint(60, 20e5))))));
    }

    @Test
    void aSampledCriterionSettingReachesEveryRealisation() {
        TrapStudy fixedLimit = richDome(new ShaleSmearFactorCriterion(4));
        TrapStudy sampledLimit = InputSamplerTest.withInputs(fixedLimit,
                ContributedInput.withDefault(new MaximumSealingSsfInput()));
        assertSameAsReference(sampledLimit);
        assertNotEquals(leakDepths(fixedLimit), leakDepths(sampledLimit),
                "drawing the SSF limit from 4 to 7 must move some leak points");
    }

    /** Leak depths of the first realisations, flattened. */
    private static List<Double> leakDepths(TrapStudy study) {
        StudyGeometry geometry = new StudyGeometry(study, SimulationSettings.DEFAULT_CELL_HEIGHT);
        InputSampler sampler = new InputSampler(study);
        RealisationEvaluator evaluator = new RealisationEvaluator(geometry);
        List<Double> depths = new ArrayList<>();
        for (int i = 0; i < REALISATIONS; i++) {
            RealisationOutcome outcome = evaluator.evaluate(sampler.sample(RealisationRandom.of(5, i)), null);
            for (int s = 0; s < evaluator.reservoirUnits().length; s++) {
                depths.add(outcome.get(s, UnitQuantity.LEAK_DEPTH));
            }
        }
        return depths;
    }

    private static TrapStudy richDome(SealCriterion criterion) {
        return SingleFaultDome.study(20, criterion, UncertainValue.normal(1, 0.3),
                Optional.of(new AtticSetup("F1", UncertainValue.uniform(1050, 1070))),
                SingleFaultDome.column(UncertainValue.normal(30, 4)), new DepthUncertainty(UncertainValue.normal(0, 5),
                        3, 800), UncertainValue.normal(750, 20), UncertainValue.fixed(1050));
    }

    /** Eight units, thin shales between sands of uncertain thickness and clay: many sand-on-sand windows. */
    private static Stratigraphy layeredColumn() {
        List<StratUnit> units = new ArrayList<>();
        units.add(StratUnit.nonReservoir("Top Seal", LithologyClass.SEAL, UncertainValue.fixed(50),
                UncertainValue.fixed(0.8)));
        for (int i = 1; i <= 4; i++) {
            units.add(new StratUnit("Sand " + i, LithologyClass.RESERVOIR, true, UncertainValue.normal(12, 3),
                    UncertainValue.uniform(0.05, 0.3), UncertainValue.fixed(0.8), UncertainValue.fixed(0.25),
                    UncertainValue.fixed(0.3), UncertainValue.fixed(1.2)));
            units.add(StratUnit.nonReservoir("Shale " + i, LithologyClass.SEAL, UncertainValue.normal(4, 1),
                    UncertainValue.uniform(0.5, 0.9)));
        }
        return new Stratigraphy(units, 1);
    }

    /** Three sands on top of each other, then a shale and a fourth sand. */
    private static Stratigraphy stackedSands() {
        List<StratUnit> units = new ArrayList<>();
        units.add(StratUnit.nonReservoir("Top Seal", LithologyClass.SEAL, UncertainValue.fixed(50),
                UncertainValue.fixed(0.8)));
        for (int i = 1; i <= 3; i++) {
            units.add(SingleFaultDome.reservoir("Sand " + i, UncertainValue.normal(10, 3)));
        }
        units.add(StratUnit.nonReservoir("Shale", LithologyClass.SEAL, UncertainValue.normal(6, 2),
                UncertainValue.fixed(0.7)));
        units.add(SingleFaultDome.reservoir("Sand 4", UncertainValue.normal(20, 3)));
        return new Stratigraphy(units, 1);
    }

    private static TrapStudy withSeal(TrapStudy study, SealSetup seal) {
        return new TrapStudy(study.name(), study.stratigraphy(), study.referenceTop(), study.compartment(),
                study.faults(), study.fluids(), seal, study.depthUncertainty(), study.userSpillDepth(),
                study.topSealCapacity(), study.attic());
    }

    private static void assertSameAsReference(TrapStudy study) {
        StudyGeometry geometry = new StudyGeometry(study, SimulationSettings.DEFAULT_CELL_HEIGHT);
        InputSampler sampler = new InputSampler(study);
        RealisationEvaluator evaluator = new RealisationEvaluator(geometry);
        int[] slotOfUnit = slotOfUnit(study, evaluator.reservoirUnits());
        int atticFault = study.attic().map(a -> geometry.faultIndex(a.drainedFaultId())).orElse(-1);
        LeakSearch search = new LeakSearch(geometry, slotOfUnit, atticFault); // reused, as by a worker
        int slots = evaluator.reservoirUnits().length;
        int leaks = 0;
        int marks = 0;
        for (int i = 0; i < REALISATIONS; i++) {
            RealisationInputs in = sampler.sample(RealisationRandom.of(5, i));
            double[] spill = new double[slots];
            RealisationOutcome outcome = evaluator.evaluate(in, null);
            for (int s = 0; s < slots; s++) {
                spill[s] = outcome.get(s, UnitQuantity.SPILL_DEPTH);
            }
            double buoyancy = in.densityContrast() * PhysicalConstants.G;
            for (boolean marking : new boolean[] { false, true }) {
                String where = "realisation " + i + (marking ? " with" : " without") + " leak map";
                ReferenceSearch expected = new ReferenceSearch(geometry, slotOfUnit, atticFault, in, spill, marking);
                double[] leak = new double[slots];
                double[] connection = new double[slots];
                LeakLocation[] locations = new LeakLocation[slots];
                ResultAccumulator.Block block = new ResultAccumulator.Block(geometry, 1);
                search.run(in, buoyancy, spill, leak, connection, locations, marking ? block.leakRuns : null);
                assertArrayEquals(expected.leak, leak, 0, where);
                assertArrayEquals(expected.connection, connection, 0, where);
                assertArrayEquals(expected.locations, locations, where);
                if (marking) {
                    marks += assertSameCells(geometry, expected.cells, block.leakRuns, where);
                }
                leaks += (int) Arrays.stream(leak).filter(Double::isFinite).count();
            }
        }
        assertTrue(leaks > 0 && marks > 0, "the realisations leak somewhere: " + leaks + " leak points, " + marks
                + " cells");
    }

    private static int[] slotOfUnit(TrapStudy study, int[] reservoirUnits) {
        int[] slot = new int[study.stratigraphy().units().size()];
        Arrays.fill(slot, -1);
        for (int s = 0; s < reservoirUnits.length; s++) {
            slot[reservoirUnits[s]] = s;
        }
        return slot;
    }

    private static int assertSameCells(StudyGeometry geometry, int[][] expected, LeakRuns actual, String where) {
        int marked = 0;
        for (FaultPlaneFrame frame : geometry.faults) {
            long[] counts = actual.counts(frame);
            for (int column = 0; column < frame.columns; column++) {
                for (int row = 0; row < frame.rows; row++) {
                    int count = expected[frame.index][row * frame.columns + column];
                    assertEquals(count, counts[row * frame.columns + column],
                            where + ", cell " + column + "/" + row);
                    marked += count;
                }
            }
        }
        return marked;
    }

    /**
     * The leak search as first written: the full juxtaposition of every column, every reservoir/reservoir interval,
     * every sample point rated by the seal criterion, cells counted once per realisation by a mark per cell.
     */
    private static final class ReferenceSearch {
        private static final double INSIDE = 1e-6;

        final double[] leak;
        final double[] connection;
        final LeakLocation[] locations;
        /** Per fault, row-major (row * columns + column). */
        final int[][] cells;

        ReferenceSearch(StudyGeometry geometry, int[] slotOfUnit, int atticFault, RealisationInputs in,
                double[] spill, boolean marking) {
            int slots = spill.length;
            leak = new double[slots];
            connection = new double[slots];
            locations = new LeakLocation[slots];
            Arrays.fill(leak, Double.POSITIVE_INFINITY);
            Arrays.fill(connection, Double.POSITIVE_INFINITY);
            cells = new int[geometry.faults.size()][];
            ResolvedColumn column = in.column();
            SealCriterion criterion = geometry.study.seal().criterion().forRealisation(in.criterionValues());
            boolean juxtapositionOnly = geometry.study.seal().juxtapositionOnly();
            double burial = geometry.study.seal().burialDepth();
            double buoyancy = in.densityContrast() * PhysicalConstants.G;
            double factor = geometry.study.seal().thresholdScale() * Math.pow(10, -in.calibrationShift());
            double refTop = column.top(geometry.referenceUnit);
            HungColumns hung = new HungColumns(column, column, geometry.referenceUnit);
            ColumnIntervals intervals = new ColumnIntervals();
            for (FaultPlaneFrame frame : geometry.faults) {
                int[] marks = marking ? new int[frame.cells()] : null;
                cells[frame.index] = marks == null ? new int[frame.cells()] : marks;
                double scale = in.throwScale()[frame.index];
                for (int k = 0; k < frame.columns; k++) {
                    if (!frame.hasData[k]) {
                        continue;
                    }
                    double zFw = frame.footwall[k] + in.depthError(frame.x[k], frame.y[k]);
                    double throwK = scale * (frame.hangingWall[k] - frame.footwall[k]);
                    double zHw = zFw + throwK;
                    hung.juxtapose(zFw, zHw, intervals);
                    for (int n = 0; n < intervals.count(); n++) {
                        if (intervals.juxtapositionClass(n) != JuxtapositionClass.RESERVOIR_RESERVOIR) {
                            continue;
                        }
                        int s = slotOfUnit[frame.compartmentOnFootwall() ? intervals.footwallUnit(n)
                                : intervals.hangingWallUnit(n)];
                        double top = intervals.top(n);
                        double base = intervals.base(n);
                        if (frame.index == atticFault) {
                            connection[s] = Math.min(connection[s], top);
                        }
                        if (juxtapositionOnly) {
                            if (top < leak[s]) {
                                leak[s] = top;
                                locations[s] = new LeakLocation(frame.bounding.id(), frame.u[k], top);
                            }
                            if (marks != null) {
                                double bottom = Math.min(base, spill[s]);
                                for (int row = Math.max(0, frame.row(top)); row < frame.rows; row++) {
                                    double centre = frame.zTop + (row + 0.5) * frame.cellHeight;
                                    if (centre >= bottom) {
                                        break;
                                    }
                                    if (centre >= top) {
                                        mark(frame, k, row, marks);
                                    }
                                }
                            }
                            continue;
                        }
                        for (double z = top + INSIDE; z < base; z = nextSample(frame, z)) {
                            FaultPointContext ctx = throwK >= 0
                                    ? new FaultPointContext(z, throwK, z + refTop - zFw, column, burial)
                                    : new FaultPointContext(z, -throwK, z + refTop - zHw, column, burial);
                            double pressure = criterion.evaluate(ctx).thresholdPressure() * factor;
                            double freeWaterLevel = z + pressure / buoyancy;
                            if (freeWaterLevel < leak[s]) {
                                leak[s] = freeWaterLevel;
                                locations[s] = new LeakLocation(frame.bounding.id(), frame.u[k], z);
                            }
                            if (marks != null && freeWaterLevel < spill[s] && z > top + INSIDE) {
                                mark(frame, k, frame.row(z), marks);
                            }
                        }
                    }
                }
            }
        }

        private static double nextSample(FaultPlaneFrame frame, double z) {
            double centre = frame.zTop + (Math.floor((z - frame.zTop) / frame.cellHeight) + 0.5) * frame.cellHeight;
            return centre > z ? centre : centre + frame.cellHeight;
        }

        private static void mark(FaultPlaneFrame frame, int column, int row, int[] marks) {
            if (row >= 0 && row < frame.rows) {
                marks[row * frame.columns + column] = 1;
            }
        }
    }
}
