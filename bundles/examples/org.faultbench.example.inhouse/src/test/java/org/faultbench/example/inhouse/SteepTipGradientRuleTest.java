package org.faultbench.example.inhouse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.faultbench.core.extension.ElementStub;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.CutOffPair;
import org.faultbench.faults.qc.FaultQcContext;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.QcRuleCatalog;
import org.faultbench.faults.qc.QcRuleContributions;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class SteepTipGradientRuleTest {

    private final Fault fault = new Fault("f1", "Fault f1", new GeometryFactory().createLineString(
            new Coordinate[] {new Coordinate(0, 0), new Coordinate(2000, 0)}), 60, 180, true);
    private final SteepTipGradientRule rule = new SteepTipGradientRule();

    /** Stations every 100 m from 0 to 2000 m, throw given by the shape. */
    private FaultQcContext context(DoubleUnaryOperator throwAt) {
        double[] u = new double[21];
        double[] fw = new double[21];
        double[] hw = new double[21];
        for (int i = 0; i < u.length; i++) {
            u[i] = 100 * i;
            fw[i] = 1000;
            hw[i] = 1000 + throwAt.applyAsDouble(u[i]);
        }
        CutOffPair pair = new CutOffPair(new CutOffLine("f1", "Top A", Wall.FOOTWALL, u, fw),
                new CutOffLine("f1", "Top A", Wall.HANGING_WALL, u, hw));
        return new FaultQcContext(fault, List.of(pair), List.of(), null, false);
    }

    @Test
    void gentleTaperPasses() {
        // linear taper to 80 m at the centre over 1000 m: gradient 0.08, below 0.1 (limit from memory)
        assertEquals(List.of(), rule.check(context(u -> 80 * (1 - Math.abs(u - 1000) / 1000))));
    }

    @Test
    void throwDroppingSteeplyAtAnEndIsFound() {
        // 80 m throw everywhere except the last station, 0 m: a drop of 80 m over 100 m, gradient 0.8 > 0.1
        List<QcFinding> findings = rule.check(context(u -> u < 2000 ? 80 : 0));
        assertEquals(1, findings.size(), findings.toString());
        QcFinding finding = findings.get(0);
        assertEquals(SteepTipGradientRule.ID, finding.ruleId());
        assertEquals(1950, finding.u(), 1e-9);
        assertEquals("Top A", finding.horizon());
        assertTrue(finding.message().contains("gradient 0.800, limit 0.100"), finding.message());
    }

    @Test
    void steepStepsAwayFromTheTipsAreLeftToTheBuiltInGradientRule() {
        // a 40 m step at u = 1000 m, in the middle of the fault, outside both tip zones (20 % of 2000 m)
        assertEquals(List.of(), rule.check(context(u -> u < 1000 ? 40 : 80)));
    }

    @Test
    void smallStepsWithinPickingNoisePass() {
        // a 4 m drop over 100 m (gradient 0.04) against a strict limit of 0.01: within the 5 m picking resolution
        // (common practice) it passes; with no resolution allowance it is found
        assertEquals(List.of(), new SteepTipGradientRule(0.01, 0.2, 5).check(context(u -> u < 2000 ? 4 : 0)));
        assertEquals(1, new SteepTipGradientRule(0.01, 0.2, 0).check(context(u -> u < 2000 ? 4 : 0)).size());
    }

    @Test
    void rejectsNonsenseSettings() {
        assertThrows(IllegalArgumentException.class, () -> new SteepTipGradientRule(0, 0.2, 5));
        assertThrows(IllegalArgumentException.class, () -> new SteepTipGradientRule(0.1, 0.7, 5));
    }

    @Test
    void registersThroughTheQcRuleExtensionPointAsPluginXmlSays() {
        QcRuleCatalog catalog = QcRuleCatalog.withBuiltIns();
        List<String> problems = QcRuleContributions.readInto(catalog, ElementStub.all(ElementStub.element("rule")
                .by("org.faultbench.example.inhouse").with("id", SteepTipGradientRule.ID)
                .with("name", "Steep throw gradient near a tip").creates("class", new SteepTipGradientRule())));
        assertEquals(List.of(), problems);
        assertTrue(catalog.find(SteepTipGradientRule.ID).isPresent());
        assertEquals(1, catalog.check(context(u -> u < 2000 ? 80 : 0)).stream()
                .filter(f -> f.ruleId().equals(SteepTipGradientRule.ID)).count());
    }
}
