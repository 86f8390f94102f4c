package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.ShaleSmearFactorCriterion;
import org.faultbench.trap.Mechanism;
import org.junit.jupiter.api.Test;

class MonteCarloSimulatorTest {
    private static final double G = 9.81;

    private static SimulationResult run(TrapStudy study, int realisations, int threads) {
        return new MonteCarloSimulator().run(study, new SimulationSettings(realisations, 11, threads, 5),
                new NullProgressMonitor());
    }

    private static UnitSummary unit(SimulationResult result, String name) {
        return result.units().stream().filter(u -> u.unitName().equals(name)).findFirst().orElseThrow();
    }

    private static double p50(UnitSummary unit, UnitQuantity q) {
        return unit.statistics(q).level(ExceedanceLevel.P50);
    }

    @Test
    void spillControlledWhenTheThrowLeavesNoReservoirWindow() {
        // T = 200 m exceeds the 150 m column: no reservoir faces reservoir (Allan 1989 juxtaposition; hand
        // calculation), so the trap fills to its spill point at the west edge: 1000 + 0.05 * 1500 = 1075 m.
        SimulationResult result = run(SingleFaultDome.juxtapositionOnly(200), 20, 1);
        UnitSummary sandA = unit(result, "Sand A");
        assertEquals(Mechanism.SPILL, sandA.baseMechanism());
        assertEquals(1075, sandA.baseCase().get(UnitQuantity.CONTACT), 1e-9);
        assertEquals(75, sandA.baseCase().get(UnitQuantity.COLUMN), 1e-9);
        assertEquals(1.0, sandA.mechanismFractions().get(Mechanism.SPILL));
        // Sand B sits 40 m deeper (30 m Sand A + 10 m shale): crest 1040, spill 1115
        UnitSummary sandB = unit(result, "Sand B");
        assertEquals(1115, sandB.baseCase().get(UnitQuantity.CONTACT), 1e-9);
        assertEquals(75, p50(sandB, UnitQuantity.COLUMN), 1e-9);
    }

    @Test
    void leakControlledAtTheShallowestJuxtapositionWindow() {
        // T = 20 m at the shallowest column (y = 0): footwall Sand A [1025, 1055) faces hanging-wall Sand A
        // [1045, 1075): the window top 1045 m is the leak point (juxtaposition-only: reservoir against reservoir
        // leaks; James et al. 2004; hand calculation). 1045 < spill 1075, so leak controls: column 45 m.
        SimulationResult result = run(SingleFaultDome.juxtapositionOnly(20), 20, 1);
        UnitSummary sandA = unit(result, "Sand A");
        assertEquals(Mechanism.LEAK, sandA.baseMechanism());
        assertEquals(1045, sandA.baseCase().get(UnitQuantity.LEAK_DEPTH), 1e-6);
        assertEquals(45, sandA.baseCase().get(UnitQuantity.COLUMN), 1e-6);
        assertEquals("F1", sandA.baseLeakLocation().faultId());
        assertEquals(1990, sandA.baseLeakLocation().u(), 1e-6, "the window top is where the fault comes closest");
        // Sand B: footwall [1065, 1125) meets hanging-wall Sand A [1045, 1075) from 1065 m: column 1065 - 1040 = 25 m
        UnitSummary sandB = unit(result, "Sand B");
        assertEquals(1065, sandB.baseCase().get(UnitQuantity.CONTACT), 1e-6);
        assertEquals(25, sandB.baseCase().get(UnitQuantity.COLUMN), 1e-6);
    }

    @Test
    void shaleGougeRatioWithBretanCapacityDelaysTheLeak() {
        // Window [s - 20, s] at the top of the Sand A/Sand A window lies in Sand A only (Vcl 0.1): SGR 10 %
        // (Yielding, Freeman & Needham 1997). Bretan et al. 2003 at 2 km burial (C = 0.5): 10^(10/27 - 0.5) bar;
        // supported column P / ((1050 - 750) g) (common practice) = 25.210 m, so the leak free-water level is
        // 1045 + 25.210 = 1070.21 m, shallower than the 1075 m spill point: leak-controlled.
        double pressure = Math.pow(10, 10.0 / 27 - 0.5) * 1e5;
        double supported = pressure / (300 * G);
        assertEquals(25.210, supported, 0.001);
        TrapStudy study = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.fixed(1),
                Optional.empty());
        SimulationResult result = run(study, 10, 1);
        UnitSummary sandA = unit(result, "Sand A");
        assertEquals(Mechanism.LEAK, sandA.baseMechanism());
        assertEquals(1045 + supported, sandA.baseCase().get(UnitQuantity.CONTACT), 1e-3);
        // Sand B: its window against hanging-wall Sand A has SGR 50 % (the shale is in the throw window) and holds;
        // its window against hanging-wall Sand B starts at 1085 m with SGR 10 %: 1085 + 25.210 = 1110.21 < 1115.
        UnitSummary sandB = unit(result, "Sand B");
        assertEquals(1085 + supported, sandB.baseCase().get(UnitQuantity.CONTACT), 1e-3);
        assertEquals(Mechanism.LEAK, sandB.baseMechanism());
    }

    @Test
    void atticContactIsTheDeeperOfConnectionAndDrainageCappedByTheOriginalContact() {
        // Drained block = the hanging wall. Shallowest Sand A connection 1045 m (window top, hand calculation);
        // well drainage depth 1060 m; original contact 1070.21 m (SGR case above). Contact after depletion:
        // min(1070.21, max(1045, 1060)) = 1060 m, attic column 60 m (the attic rule of this project's brief).
        TrapStudy study = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.fixed(1),
                Optional.of(new AtticSetup("F1", UncertainValue.fixed(1060))));
        UnitSummary sandA = unit(run(study, 10, 1), "Sand A");
        assertEquals(1045, sandA.baseCase().get(UnitQuantity.CONNECTION_DEPTH), 1e-6);
        assertEquals(1060, sandA.baseCase().get(UnitQuantity.ATTIC_CONTACT), 1e-9);
        assertEquals(60, sandA.baseCase().get(UnitQuantity.ATTIC_COLUMN), 1e-9);
        double original = sandA.baseCase().get(UnitQuantity.STOIIP);
        double attic = sandA.baseCase().get(UnitQuantity.ATTIC_STOIIP);
        assertTrue(attic > 0 && attic < original, attic + " of " + original);
    }

    @Test
    void leakProbabilityIsOneInsideTheWindowAndZeroInSealedRock() {
        SimulationResult result = run(SingleFaultDome.juxtapositionOnly(20), 8, 2);
        LeakProbabilityMap map = result.leakMaps().get(0);
        int column = 199; // y = 0
        int windowRow = (int) Math.floor((1050 - map.zTop()) / map.cellHeight());
        int sealedRow = (int) Math.floor((1035 - map.zTop()) / map.cellHeight());
        assertEquals(1.0, map.probability(column, windowRow), "Sand A on Sand A above the spill depth leaks");
        assertEquals(0.0, map.probability(column, sealedRow), "Sand A on Top Seal does not");
        assertEquals(1.0, map.maximum());
    }

    @Test
    void sameSeedGivesBitIdenticalResultsOnOneTwoFourAndEightThreads() {
        TrapStudy study = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.normal(1, 0.15),
                Optional.of(new AtticSetup("F1", UncertainValue.uniform(1050, 1070))),
                SingleFaultDome.column(UncertainValue.normal(30, 4)), new DepthUncertainty(UncertainValue.normal(0, 5), 3, 800),
                UncertainValue.normal(750, 20), UncertainValue.fixed(1050));
        SimulationResult one = run(study, 96, 1);
        for (int threads : new int[] { 2, 4, 8 }) {
            SimulationResult many = run(study, 96, threads);
            for (int s = 0; s < one.units().size(); s++) {
                for (UnitQuantity q : UnitQuantity.values()) {
                    for (ExceedanceLevel level : ExceedanceLevel.values()) {
                        assertEquals(Double.doubleToLongBits(one.units().get(s).statistics(q).level(level)),
                                Double.doubleToLongBits(many.units().get(s).statistics(q).level(level)),
                                q + " " + level + " on " + threads + " threads");
                    }
                }
            }
            assertTrue(java.util.Arrays.equals(one.leakMaps().get(0).probability(),
                    many.leakMaps().get(0).probability()));
        }
        UnitSummary sandA = one.units().get(0);
        double p90 = sandA.statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P90);
        double p10 = sandA.statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P10);
        assertTrue(p90 < p10, "uncertain inputs spread the contact: " + p90 + " .. " + p10);
    }

    @Test
    void tornadoRanksTheThrowScaleFirstForALeakControlledTrap() {
        TrapStudy study = SingleFaultDome.study(20, new ShaleGougeRatioCriterion(), UncertainValue.normal(1, 0.25),
                Optional.empty(), SingleFaultDome.column(UncertainValue.normal(30, 1)), DepthUncertainty.NONE,
                UncertainValue.fixed(750), UncertainValue.fixed(1050));
        List<TornadoBar> bars = run(study, 4, 1).tornado().get("Sand A");
        assertFalse(bars.isEmpty());
        assertEquals("throw scale of fault F1", bars.get(0).input(), bars.toString());
        for (int i = 1; i < bars.size(); i++) {
            assertTrue(bars.get(i - 1).swing() >= bars.get(i).swing(), "ranked by swing");
        }
    }

    @Test
    void aContributedInputIsRankedInTheTornadoAndLeavesOtherStudiesAlone() {
        // Throw 45 m: footwall Sand B meets hanging-wall Sand A with the 10 m shale slipped past, SSF = 45 / 10 = 4.5
        // (Lindsay et al. 1993; hand calculation), sealing only when the drawn limit is above 4.5. The tornado's
        // low case (limit 4.3) leaks there, the high case (6.7) does not, so Sand B's contact moves.
        TrapStudy plain = SingleFaultDome.study(45, new ShaleSmearFactorCriterion(), UncertainValue.fixed(1),
                Optional.empty());
        TrapStudy sampled = InputSamplerTest.withInputs(plain,
                ContributedInput.withDefault(new MaximumSealingSsfInput()));
        List<String> inputs = run(sampled, 4, 1).tornado().get("Sand B").stream().map(TornadoBar::input).toList();
        assertTrue(inputs.contains("maximum sealing SSF"), inputs.toString());
        SimulationResult before = run(plain, 40, 2);
        SimulationResult withEmptyList = run(InputSamplerTest.withInputs(plain), 40, 2);
        assertEquals(before.units().get(0).statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P50),
                withEmptyList.units().get(0).statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P50), 0,
                "a study that names no contributed input draws as before");
    }

    @Test
    void cancellingReturnsAPartialResultMarkedIncomplete() {
        NullProgressMonitor monitor = new NullProgressMonitor() {
            private int ticks;

            @Override
            public void worked(int work) {
                if (++ticks == 2) {
                    setCanceled(true);
                }
            }

            @Override
            public void internalWorked(double work) {
                worked(1);
            }
        };
        SimulationResult result = new MonteCarloSimulator().run(SingleFaultDome.juxtapositionOnly(20),
                new SimulationSettings(100_000, 1, 2, 5), monitor);
        assertFalse(result.complete());
        assertTrue(result.realisationsRun() < 100_000, "ran " + result.realisationsRun());
    }
}
