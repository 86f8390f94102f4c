package org.faultbench.trap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.fluid.Buoyancy;
import org.faultbench.core.units.PhysicalConstants;
import org.junit.jupiter.api.Test;

class LeakPointFinderTest {
    private final LeakPointFinder finder = new LeakPointFinder(new Buoyancy(1050, 750, PhysicalConstants.G));

    /** Fault-zone threshold in Pa: Bretan, Yielding & Jones 2003, AAPG Bull. 87, FZP = 10^(SGR/27 - 0.5) bar. */
    private static double bretanShallowPa(double sgrPercent) {
        return Math.pow(10, sgrPercent / 27 - 0.5) * 1e5;
    }

    @Test
    void bretanCapacitiesMatchThePublishedCheckValues() {
        // Bretan et al. 2003: SGR 20 % -> 1.7408 bar, SGR 15 % -> 1.1365 bar (burial < 3 km); hand calculation
        assertEquals(1.7408e5, bretanShallowPa(20), 5);
        assertEquals(1.1365e5, bretanShallowPa(15), 5);
    }

    @Test
    void leakDepthIsTheShallowestSupportedFreeWaterLevel() {
        // FWL = z + P / ((rho_w - rho_o) g): 1050 + 174080 / 2943 = 1109.15 m, 1020 + 113650 / 2943 = 1058.62 m
        // (Bretan et al. 2003 leak logic; hand calculation)
        LeakCandidate deep = new LeakCandidate("F1", 400, 1050, 1.7408e5);
        LeakCandidate shallow = new LeakCandidate("F1", 900, 1020, 1.1365e5);
        assertEquals(1109.15, finder.find(List.of(deep)).orElseThrow().freeWaterLevel(), 0.005);
        LeakPoint leak = finder.find(List.of(deep, shallow)).orElseThrow();
        assertSame(shallow, leak.candidate());
        assertEquals(1058.62, leak.freeWaterLevel(), 0.005);
    }

    @Test
    void windowWithoutFaultRockLeaksAtItsOwnDepth() {
        // juxtaposition leak: threshold 0, FWL = z (common practice)
        LeakCandidate window = new LeakCandidate("F2", 10, 1065, 0);
        LeakCandidate gouge = new LeakCandidate("F1", 400, 1050, 1.7408e5);
        LeakPoint leak = finder.find(List.of(gouge, window)).orElseThrow();
        assertSame(window, leak.candidate());
        assertEquals(1065, leak.freeWaterLevel());
    }

    @Test
    void noCandidatesNoLeak() {
        assertTrue(finder.find(List.of()).isEmpty());
    }

    @Test
    void badCandidatesAreRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new LeakCandidate("F1", 0, Double.NaN, 0));
        assertEquals("leak candidate on fault 'F1': u and z must be finite numbers, was u = 0.0, z = NaN",
                e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new LeakCandidate("F1", 0, 1000, -5));
        assertTrue(e.getMessage().contains("threshold pressure") && e.getMessage().contains("-5.0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new LeakCandidate(" ", 0, 1000, 0));
        assertTrue(e.getMessage().contains("fault id"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> finder.find(null));
    }
}
