package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.bell;
import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.CutOffPair;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;

class TipThrowRuleTest {

    private final TipThrowRule rule = new TipThrowRule();
    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 2000);
    /** Throw is largest (80 m) at u = 0 and dies out at u = 2000: the fault continues west of its mapped trace. */
    private final CutOffPair truncated = pair("f1", "Top A", 1000, stations(0, 2000, 100), bell(80, 0, 2000));

    @Test
    void throwThatDoesNotDieOutAtAnEndIsFlagged() {
        List<QcFinding> findings = rule.check(TestFaults.alone(fault, truncated));
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(0, findings.get(0).u(), 0, "the west end");
    }

    @Test
    void endThrowIsExplainedByAnAbuttingFault() {
        Fault crossing = new Fault("f2", "Cross", new GeometryFactory().createLineString(new Coordinate[] {
            new Coordinate(-20, -500), new Coordinate(-20, 500)}), 60, 270, true);
        FaultQcContext ctx = new FaultQcContext(fault, List.of(truncated), List.of(crossing), null, false);
        assertEquals(List.of(), rule.check(ctx), "the trace ends 20 m from another fault");
    }

    @Test
    void endThrowIsExplainedByTheMapEdge() {
        FaultQcContext ctx = new FaultQcContext(fault, List.of(truncated), List.of(), new Envelope(-50, 5000, -3000,
                3000), false);
        assertEquals(List.of(), rule.check(ctx), "the west end lies 50 m inside the map edge");
    }

    @Test
    void profileThatDiesOutAtBothEndsPasses() {
        CutOffPair whole = pair("f1", "Top A", 1000, stations(0, 2000, 100), bell(80, 1000, 1000));
        assertEquals(List.of(), rule.check(TestFaults.alone(fault, whole)));
    }
}
