package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

class ExceedanceLevelTest {

    @Test
    void p90IsTheLowCaseOfNormal100Sd10() {
        NormalDistribution n = new NormalDistribution(100, 10);
        // PRMS (SPE/WPC/AAPG/SPEE 2018) exceedance definition; z(0.90) = 1.28155 from standard normal tables:
        // P90 = 100 - 12.8155 = 87.18, P10 = 112.82.
        assertEquals(87.18, n.inverseCumulativeProbability(ExceedanceLevel.P90.cumulativeProbability()), 0.005);
        assertEquals(100.0, n.inverseCumulativeProbability(ExceedanceLevel.P50.cumulativeProbability()), 1e-9);
        assertEquals(112.82, n.inverseCumulativeProbability(ExceedanceLevel.P10.cumulativeProbability()), 0.005);
    }

    @Test
    void labelsNameTheConvention() {
        assertTrue(ExceedanceLevel.P90.label().contains("low case"));
        assertTrue(ExceedanceLevel.P10.label().contains("high case"));
    }
}
