package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.bell;
import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.CutOffPair;
import org.junit.jupiter.api.Test;

class DeeperLessThrowRuleTest {

    private final DeeperLessThrowRule rule = new DeeperLessThrowRule();
    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 4000);
    private final double[] u = stations(0, 4000, 100);
    private final CutOffPair top = pair("f1", "Top A", 1000, u, bell(80, 2000, 2000));

    @Test
    void deeperHorizonWithHalfTheThrowIsFlaggedWhereTheDeficitIsLargest() {
        CutOffPair base = pair("f1", "Base A", 1200, u, bell(40, 2000, 2000));
        List<QcFinding> findings = rule.check(new FaultQcContext(fault, List.of(top, base), List.of(), null, false));
        assertEquals(1, findings.size(), findings.toString());
        assertEquals("Base A", findings.get(0).horizon());
        assertEquals(2000, findings.get(0).u(), 0, "deficit 40 m at the centre");
    }

    @Test
    void growthFaultsAndConstantOrDownwardIncreasingThrowPass() {
        CutOffPair lessBelow = pair("f1", "Base A", 1200, u, bell(40, 2000, 2000));
        assertEquals(List.of(), rule.check(new FaultQcContext(fault, List.of(top, lessBelow), List.of(), null, true)),
                "marked as a growth fault");
        CutOffPair same = pair("f1", "Base A", 1200, u, bell(78, 2000, 2000));
        assertEquals(List.of(), rule.check(new FaultQcContext(fault, List.of(top, same), List.of(), null, false)));
        CutOffPair more = pair("f1", "Base A", 1200, u, bell(120, 2000, 2000));
        assertEquals(List.of(), rule.check(new FaultQcContext(fault, List.of(top, more), List.of(), null, false)));
    }
}
