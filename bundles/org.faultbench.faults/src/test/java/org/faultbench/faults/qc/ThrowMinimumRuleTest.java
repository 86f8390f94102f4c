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

class ThrowMinimumRuleTest {

    private final ThrowMinimumRule rule = new ThrowMinimumRule();
    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 4000);

    @Test
    void twoLinkedSegmentsShowOneMinimumAtTheirRelay() {
        DoubleUnaryOperator west = bell(80, 1000, 1200);
        DoubleUnaryOperator east = bell(70, 3000, 1200);
        // hand calculation: at u = 2000 both segments are at r = 0.83, about 0.13 of their maxima: ~19 m of throw
        // between maxima near 80 and 70 m
        List<QcFinding> findings = rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000,
                stations(0, 4000, 100), u -> west.applyAsDouble(u) + east.applyAsDouble(u))));
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(2000, findings.get(0).u(), 100);
    }

    @Test
    void noisyTroughIsReportedOnceAtItsLowestStation() {
        DoubleUnaryOperator west = bell(80, 1000, 1200);
        DoubleUnaryOperator east = bell(70, 3000, 1200);
        Random random = new Random(17);
        List<QcFinding> findings = rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000,
                stations(0, 4000, 50), u -> west.applyAsDouble(u) + east.applyAsDouble(u)
                        + 3 * random.nextGaussian())));
        assertEquals(1, findings.size(), "3 m noise makes several local minima inside one trough: " + findings);
        assertEquals(2000, findings.get(0).u(), 200);
    }

    @Test
    void singleNoisyProfileHasNoMarkedMinimum() {
        Random random = new Random(9);
        DoubleUnaryOperator smooth = bell(80, 2000, 2000);
        assertEquals(List.of(), rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000,
                stations(0, 4000, 100), u -> smooth.applyAsDouble(u) + 2 * random.nextGaussian()))));
    }
}
