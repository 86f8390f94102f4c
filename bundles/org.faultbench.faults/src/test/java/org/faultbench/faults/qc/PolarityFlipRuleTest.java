package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.alone;
import static org.faultbench.faults.qc.TestFaults.bell;
import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;

class PolarityFlipRuleTest {

    private final PolarityFlipRule rule = new PolarityFlipRule();
    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 4000);

    @Test
    void twoOppositeSegmentsAreFlaggedWhereTheyMeet() {
        FaultQcContext ctx = alone(fault, pair("f1", "Top A", 1000, stations(0, 4000, 100),
                TestFaults.twoOppositeSegments()));
        List<QcFinding> findings = rule.check(ctx);
        assertEquals(1, findings.size(), findings.toString());
        QcFinding flip = findings.get(0);
        // hand construction: the segments meet at u = 2000 m (within one 100 m station spacing)
        assertEquals(2000, flip.u(), 100);
        assertEquals("Top A", flip.horizon());
        assertEquals(Severity.WARNING, flip.severity());
        assertTrue(flip.suggestion().contains("split"), flip.suggestion());
    }

    @Test
    void singlePolarityFaultIsNotFlaggedEvenWithNoiseAtItsTips() {
        Random random = new Random(3);
        FaultQcContext ctx = alone(fault, pair("f1", "Top A", 1000, stations(0, 4000, 100),
                u -> bell(80, 2000, 2000).applyAsDouble(u) + 3 * (2 * random.nextDouble() - 1)));
        // noise of up to 3 m makes the throw near the tips change sign, but stays within the 5 m resolution
        assertEquals(List.of(), rule.check(ctx));
    }

    @Test
    void signChangeBetweenNeighbouringStationsIsPlacedAtTheZeroCrossing() {
        FaultQcContext ctx = alone(fault, pair("f1", "Top A", 1000, new double[] {0, 100, 200, 300},
                u -> u < 150 ? 20 - u / 10 : -(u / 10 - 10)));
        // throws 20, 10, -10, -20 m: linear interpolation crosses zero half-way between 100 and 200 m (hand calc)
        assertEquals(150, rule.check(ctx).get(0).u(), 1e-9);
    }
}
