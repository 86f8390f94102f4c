package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.CutOffPair;
import org.junit.jupiter.api.Test;

class CrossingCutOffRuleTest {

    private final CrossingCutOffRule rule = new CrossingCutOffRule();
    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 4000);
    private final double[] u = stations(0, 4000, 500);
    private final CutOffPair top = pair("f1", "Top A", 1000, u, x -> 50);

    @Test
    void deeperFootwallCutOffRisingAboveTheShallowerOneIsAnError() {
        double[] footwall = {1050, 1050, 1050, 1050, 950, 950, 950, 950, 950};
        double[] hangingWall = {1100, 1100, 1100, 1100, 1100, 1100, 1100, 1100, 1100};
        CutOffPair base = new CutOffPair(new CutOffLine("f1", "Base A", Wall.FOOTWALL, u, footwall),
                new CutOffLine("f1", "Base A", Wall.HANGING_WALL, u, hangingWall));
        List<QcFinding> findings = rule.check(new FaultQcContext(fault, List.of(top, base), List.of(), null, false));
        assertEquals(1, findings.size(), findings.toString());
        // Base A footwall at 950 m from u = 2000 m lies above Top A's 1000 m (hand construction)
        assertEquals(2000, findings.get(0).u(), 0);
        assertEquals(Severity.ERROR, findings.get(0).severity());
        assertEquals("Base A", findings.get(0).horizon());
    }

    @Test
    void parallelCutOffLinesPass() {
        CutOffPair base = pair("f1", "Base A", 1100, u, x -> 50);
        assertEquals(List.of(), rule.check(new FaultQcContext(fault, List.of(top, base), List.of(), null, false)));
    }
}
