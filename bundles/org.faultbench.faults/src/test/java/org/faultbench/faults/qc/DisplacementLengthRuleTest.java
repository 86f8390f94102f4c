package org.faultbench.faults.qc;

import static org.faultbench.faults.qc.TestFaults.bell;
import static org.faultbench.faults.qc.TestFaults.pair;
import static org.faultbench.faults.qc.TestFaults.stations;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.Fault;
import org.junit.jupiter.api.Test;

/** Envelope D/L in [0.001, 0.1] for normal faults (Cowie & Scholz 1992; Schultz et al. 2008; from memory). */
class DisplacementLengthRuleTest {

    private final DisplacementLengthRule rule = new DisplacementLengthRule();

    private List<QcFinding> check(double length, double maxThrow) {
        Fault fault = TestFaults.eastWest("f1", 0, 0, length);
        return rule.check(TestFaults.alone(fault, pair("f1", "Top A", 1000, stations(0, length, length / 40),
                bell(maxThrow, length / 2, length / 2))));
    }

    @Test
    void overDisplacedFaultIsFlagged() {
        // hand calculation: 200 m throw on a 60 degree fault is 230.9 m displacement; over 1000 m, D/L = 0.23 > 0.1
        List<QcFinding> findings = check(1000, 200);
        assertEquals(1, findings.size());
        assertTrue(findings.get(0).message().contains("0.231"), findings.get(0).message());
        assertTrue(Double.isNaN(findings.get(0).u()), "concerns the whole fault");
    }

    @Test
    void underDisplacedFaultIsFlagged() {
        // 5 m throw / sin 60 = 5.77 m over 10 km: D/L = 5.8e-4 < 0.001 (hand calculation)
        List<QcFinding> findings = check(10_000, 5);
        assertEquals(1, findings.size());
        assertTrue(findings.get(0).suggestion().contains("joined"), findings.get(0).suggestion());
    }

    @Test
    void faultInsideTheEnvelopePasses() {
        // 80 m / sin 60 = 92.4 m over 4 km: D/L = 0.023 (hand calculation), near Schlische et al. 1996's 0.03
        assertEquals(List.of(), check(4000, 80));
    }
}
