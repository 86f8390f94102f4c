package org.faultbench.faults.qc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;

class QcRuleCatalogTest {

    /** An in-house rule that fails on every fault. */
    private static final class BrokenRule implements FaultQcRule {
        @Override
        public String id() {
            return "broken";
        }

        @Override
        public String name() {
            return "Broken";
        }

        @Override
        public List<QcFinding> check(FaultQcContext ctx) {
            throw new IllegalStateException("index out of range");
        }
    }

    @Test
    void builtInsCoverEveryCheckOfTheIssue() {
        List<String> ids = QcRuleCatalog.withBuiltIns().list().stream().map(FaultQcRule::id).toList();
        assertEquals(List.of(PolarityFlipRule.ID, TipThrowRule.ID, ThrowGradientRule.ID, ThrowMinimumRule.ID,
                DisplacementLengthRule.ID, DeeperLessThrowRule.ID, CrossingCutOffRule.ID, WallOrderRule.ID), ids);
    }

    @Test
    void takenIdsAreRejected() {
        QcRuleCatalog catalog = QcRuleCatalog.withBuiltIns();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> catalog.register(new PolarityFlipRule(2)));
        assertTrue(e.getMessage().contains("already registered"), e.getMessage());
    }

    @Test
    void aFailingRuleBecomesAnErrorFindingAndTheOthersStillRun() {
        QcRuleCatalog catalog = new QcRuleCatalog();
        catalog.register(new BrokenRule());
        catalog.register(new PolarityFlipRule());
        Fault fault = TestFaults.eastWest("f1", 0, 0, 4000);
        List<QcFinding> findings = catalog.check(TestFaults.alone(fault, TestFaults.pair("f1", "Top A", 1000,
                TestFaults.stations(0, 4000, 100), TestFaults.twoOppositeSegments())));
        assertEquals(2, findings.size(), findings.toString());
        assertEquals("broken", findings.get(0).ruleId());
        assertEquals(Severity.ERROR, findings.get(0).severity());
        assertTrue(findings.get(0).message().contains("index out of range"), findings.get(0).message());
        assertEquals(PolarityFlipRule.ID, findings.get(1).ruleId());
    }
}
