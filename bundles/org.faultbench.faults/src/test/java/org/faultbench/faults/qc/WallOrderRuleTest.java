package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.bell;
import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class WallOrderRuleTest {

    private final WallOrderRule rule = new WallOrderRule();
    private final Fault normal = TestFaults.eastWest("f1", 0, 0, 4000);
    private final double[] u = stations(0, 4000, 100);

    @Test
    void footwallDeeperAlongTheWholeNormalFaultPointsToSwappedWalls() {
        List<QcFinding> findings = rule.check(TestFaults.alone(normal, pair("f1", "Top A", 1000, u,
                bell(-80, 2000, 2000))));
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(2000, findings.get(0).u(), 0, "largest wrong-sense throw at the centre");
        assertTrue(findings.get(0).suggestion().contains("Swap the walls"), findings.get(0).suggestion());
    }

    @Test
    void footwallDeeperAlongPartOfTheFaultPointsToASplit() {
        List<QcFinding> findings = rule.check(TestFaults.alone(normal, pair("f1", "Top A", 1000, u,
                TestFaults.twoOppositeSegments())));
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(3000, findings.get(0).u(), 0, "the reverse-throw segment peaks at u = 3000 m");
        assertTrue(findings.get(0).suggestion().contains("Split"), findings.get(0).suggestion());
    }

    @Test
    void throwOfTheFaultsOwnSensePasses() {
        assertEquals(List.of(), rule.check(TestFaults.alone(normal, pair("f1", "Top A", 1000, u,
                bell(80, 2000, 2000)))));
        Fault reverse = new Fault("f1", "Thrust", new GeometryFactory().createLineString(new Coordinate[] {
            new Coordinate(0, 0), new Coordinate(4000, 0)}), 30, 180, false);
        // on a reverse fault the hanging wall is up: negative throw is its own sense (common practice)
        assertEquals(List.of(), rule.check(TestFaults.alone(reverse, pair("f1", "Top A", 1000, u,
                bell(-80, 2000, 2000)))));
    }
}
