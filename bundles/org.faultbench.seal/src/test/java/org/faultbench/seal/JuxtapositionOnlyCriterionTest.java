package org.faultbench.seal;

import static org.faultbench.seal.TestColumns.point;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.junit.jupiter.api.Test;

class JuxtapositionOnlyCriterionTest {

    private final JuxtapositionOnlyCriterion criterion = new JuxtapositionOnlyCriterion();
    private final ResolvedColumn column = TestColumns.sandShaleSand();

    @Test
    void sandOnSandWindowLeaksAndEverythingElseSeals() {
        // T = 60: FW sand B [80, 130] faces HW sand A (shifted to [60, 110]) over FW s in [80, 110], a 30 m window
        // (Allan 1989 juxtaposition; overlap max(0, min(b1, b2 + T) - max(a1, a2 + T)), common practice; hand calc)
        assertEquals(0, threshold(80), 0);
        assertEquals(0, threshold(109.9), 0);
        assertEquals(Double.POSITIVE_INFINITY, threshold(110), "FW sand B faces HW shale");
        assertEquals(Double.POSITIVE_INFINITY, threshold(79.9), "FW shale");
        assertEquals(Double.POSITIVE_INFINITY, threshold(30), "FW sand A faces overburden");
    }

    @Test
    void validForEveryLithologyAndNeverWarns() {
        assertEquals(LithologyClass.values().length, criterion.validFor().size());
        assertTrue(criterion.applicabilityWarnings(point(column, 100, 60)).isEmpty());
        assertEquals(SealBasis.JUXTAPOSITION, criterion.evaluate(point(column, 100, 60)).basis());
    }

    private double threshold(double footwallPosition) {
        return criterion.evaluate(point(column, footwallPosition, 60)).thresholdPressure();
    }
}
