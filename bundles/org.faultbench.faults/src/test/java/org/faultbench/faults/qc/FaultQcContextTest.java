package org.faultbench.faults.qc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.CutOffPair;
import org.junit.jupiter.api.Test;

class FaultQcContextTest {

    private final Fault fault = TestFaults.eastWest("f1", 0, 0, 1000);
    private final double[] u = TestFaults.stations(0, 1000, 100);

    @Test
    void profilesFollowTheCutOffsAndTheFaultIsNotItsOwnNeighbour() {
        CutOffPair top = TestFaults.pair("f1", "Top A", 1000, u, x -> 30);
        CutOffPair base = TestFaults.pair("f1", "Base A", 1100, u, x -> 40);
        Fault other = TestFaults.eastWest("f2", 0, 500, 1000);
        FaultQcContext ctx = new FaultQcContext(fault, List.of(top, base), List.of(fault, other), null, true);
        assertEquals(List.of("Top A", "Base A"), ctx.throwProfiles().stream().map(p -> p.horizon()).toList());
        assertEquals(40, ctx.throwProfile("Base A").orElseThrow().throwAtU(500), 1e-9);
        assertEquals(List.of(other), ctx.otherFaults());
        assertTrue(ctx.mapExtent().isEmpty());
        assertTrue(ctx.isGrowthFault());
    }

    @Test
    void cutOffsOfAnotherFaultOrARepeatedHorizonAreRejected() {
        CutOffPair foreign = TestFaults.pair("f9", "Top A", 1000, u, x -> 30);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TestFaults.alone(fault, foreign));
        assertTrue(e.getMessage().contains("f9"), e.getMessage());
        CutOffPair top = TestFaults.pair("f1", "Top A", 1000, u, x -> 30);
        assertThrows(IllegalArgumentException.class, () -> TestFaults.alone(fault, top, top));
    }
}
