package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.bell;
import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;

class ThrowGradientRuleTest {

    private final ThrowGradientRule rule = new ThrowGradientRule();
    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 4000);

    @Test
    void misPickedStationGivesOneFindingThere() {
        DoubleUnaryOperator smooth = bell(80, 2000, 2000);
        // one cut-off mis-picked 40 m too shallow at u = 1500 m: steps of about 40 m over 100 m (gradient 0.4)
        List<QcFinding> findings = rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000,
                stations(0, 4000, 100), u -> smooth.applyAsDouble(u) - (u == 1500 ? 40 : 0))));
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(1500, findings.get(0).u(), 50, "the mis-pick lies between the two steep steps");
    }

    @Test
    void smoothProfileAndSmallNoiseOnCloseStationsPass() {
        // bell profile 80 m over 4 km: steepest gradient about 0.05 (hand calculation from the shape)
        assertEquals(List.of(), rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000,
                stations(0, 4000, 100), bell(80, 2000, 2000)))));
        Random random = new Random(5);
        DoubleUnaryOperator smooth = bell(80, 2000, 2000);
        // stations every 5 m with up to 2 m noise: gradients up to 0.8 but every step within the 5 m resolution
        assertEquals(List.of(), rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000,
                stations(0, 4000, 5), u -> smooth.applyAsDouble(u) + 2 * (2 * random.nextDouble() - 1)))));
    }
}
