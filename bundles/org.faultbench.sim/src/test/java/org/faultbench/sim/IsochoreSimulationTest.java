package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.JuxtapositionOnlyCriterion;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.strat.Isochore;
import org.faultbench.strat.IsochoreThickness;
import org.faultbench.strat.Stratigraphy;
import org.junit.jupiter.api.Test;

/** Isochore thicknesses in the simulator: per fault-plane column, per crest and per grid node. */
class IsochoreSimulationTest {

    private static TrapStudy dome(SealCriterion criterion, Stratigraphy strat) {
        return SingleFaultDome.study(20, criterion, UncertainValue.normal(1, 0.3), Optional.of(new AtticSetup("F1",
                UncertainValue.uniform(1050, 1070))), strat, new DepthUncertainty(UncertainValue.normal(0, 5), 0, 800),
                UncertainValue.normal(750, 20), UncertainValue.fixed(1050));
    }

    private static Stratigraphy withIsochores(Stratigraphy strat, double sandA, double sandB) {
        return strat.withThicknessModel(new IsochoreThickness(Map.of(
                "Sand A", new Isochore("a.asc", RegularGrid.sample(SingleFaultDome.GRID, (x, y) -> sandA),
                        UncertainValue.fixed(1)),
                "Sand B", new Isochore("b.asc", RegularGrid.sample(SingleFaultDome.GRID, (x, y) -> sandB),
                        UncertainValue.fixed(1)))));
    }

    private static SimulationResult run(TrapStudy study) {
        return new MonteCarloSimulator().run(study, new SimulationSettings(200, 9, 2,
                SimulationSettings.DEFAULT_CELL_HEIGHT), new NullProgressMonitor());
    }

    @Test
    void anIsochoreEqualToTheConstantReproducesTheConstantResults() {
        for (SealCriterion criterion : List.of(new JuxtapositionOnlyCriterion(), new ShaleGougeRatioCriterion())) {
            Stratigraphy layerCake = SingleFaultDome.column(UncertainValue.fixed(30));
            SimulationResult constant = run(dome(criterion, layerCake));
            SimulationResult isochore = run(dome(criterion, withIsochores(layerCake, 30, 60)));
            for (int u = 0; u < constant.units().size(); u++) {
                UnitSummary a = constant.units().get(u);
                UnitSummary b = isochore.units().get(u);
                assertEquals(a.mechanismFractions(), b.mechanismFractions());
                for (UnitQuantity q : UnitQuantity.values()) {
                    if (q == UnitQuantity.STOIIP || q == UnitQuantity.ATTIC_STOIIP) {
                        continue; // compared realisation by realisation below (percentile estimates amplify round-off)
                    }
                    for (ExceedanceLevel level : ExceedanceLevel.values()) {
                        assertEquals(a.statistics(q).level(level), b.statistics(q).level(level), 0,
                                a.unitName() + " " + q + " " + level);
                    }
                    assertEquals(a.statistics(q).mean(), b.statistics(q).mean(), 0, a.unitName() + " " + q);
                }
            }
            assertSameVolumes(dome(criterion, layerCake), dome(criterion, withIsochores(layerCake, 30, 60)));
            for (int f = 0; f < constant.leakMaps().size(); f++) {
                assertArrayEquals(constant.leakMaps().get(f).probability(), isochore.leakMaps().get(f).probability(),
                        0, "leak map");
            }
        }
    }

    /**
     * Volumes realisation by realisation: the isochore sums node by node, the area-depth table by sorted prefix sums,
     * so they agree to round-off only.
     */
    private static void assertSameVolumes(TrapStudy constant, TrapStudy isochore) {
        RealisationEvaluator a = new RealisationEvaluator(new StudyGeometry(constant, 5));
        RealisationEvaluator b = new RealisationEvaluator(new StudyGeometry(isochore, 5));
        InputSampler sa = new InputSampler(constant);
        InputSampler sb = new InputSampler(isochore);
        for (int i = 0; i < 50; i++) {
            RealisationOutcome oa = a.evaluate(sa.sample(RealisationRandom.of(9, i)), null);
            RealisationOutcome ob = b.evaluate(sb.sample(RealisationRandom.of(9, i)), null);
            for (int s = 0; s < 2; s++) {
                for (UnitQuantity q : List.of(UnitQuantity.STOIIP, UnitQuantity.ATTIC_STOIIP)) {
                    assertEquals(oa.get(s, q), ob.get(s, q), 1e-12 * Math.abs(oa.get(s, q)), "realisation " + i);
                }
            }
        }
    }

    @Test
    void aLinearIsochoreSetsTheUnitBaseAlongTheFault() {
        // Sand A thickens northwards: t = 20 + 0.01·(y + 2000) m, all inputs fixed. Hand calculation near y = 0:
        // footwall cut-off zFw = 1000 + 0.05·hypot(500, y) (1025 m at y = 0), throw 20 m, so hanging-wall Sand A
        // faces footwall Sand A from zFw + 20 to the footwall base zFw + t (1045 to 1065 m at y = 0, t = 40 m), above
        // Sand A's spill depth 1075 m: those cells leak. Footwall Shale then faces hanging-wall Sand A from zFw + t to
        // zFw + t + 10: no leak there. With a constant 30 m the base would be at zFw + 30.
        Stratigraphy layerCake = SingleFaultDome.column(UncertainValue.fixed(30));
        Stratigraphy linear = layerCake.withThicknessModel(new IsochoreThickness(Map.of("Sand A", new Isochore(
                "a.asc", RegularGrid.sample(SingleFaultDome.GRID, (x, y) -> 20 + 0.01 * (y + 2000)),
                UncertainValue.fixed(1)))));
        SimulationResult result = run(SingleFaultDome.study(20, new JuxtapositionOnlyCriterion(),
                UncertainValue.fixed(1), Optional.empty(), linear, DepthUncertainty.NONE, UncertainValue.fixed(750),
                UncertainValue.fixed(1050)));
        LeakProbabilityMap map = result.leakMaps().get(0);
        int checked = 0;
        for (int column = 0; column < map.columns(); column += 40) {
            double y = -1990 + map.u()[column]; // the trace runs north from (0, -1990)
            double zFw = SingleFaultDome.topFootwall(0, y);
            double base = zFw + 20 + 0.01 * (y + 2000);
            for (int row = 0; row < map.rows(); row++) {
                double centre = map.zTop() + (row + 0.5) * map.cellHeight();
                if (centre >= zFw + 20 && centre < Math.min(base, 1075)) {
                    assertEquals(1, map.probability(column, row), "y " + y + ", z " + centre + " in Sand A/Sand A");
                    checked++;
                } else if (centre >= base + 0.5 && centre < base + 9.5) {
                    assertEquals(0, map.probability(column, row), "y " + y + ", z " + centre + " Shale/Sand A");
                    checked++;
                }
            }
        }
        assertEquals(true, checked > 20, "cells checked: " + checked);
    }
}
