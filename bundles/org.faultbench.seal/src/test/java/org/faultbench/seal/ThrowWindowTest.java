package org.faultbench.seal;

import static org.faultbench.seal.TestColumns.point;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class ThrowWindowTest {

    private final ThrowWindow window = ThrowWindow.of(point(TestColumns.sandShaleSand(), 100, 60));

    @Test
    void windowSpansFromHangingWallToFootwallPosition() {
        assertEquals(40, window.top(), 0);
        assertEquals(100, window.base(), 0);
        assertEquals(60, window.length(), 0);
        assertTrue(window.insideColumn());
    }

    @Test
    void overlapsClipUnitsToTheWindow() {
        assertEquals(10, window.overlap(0), 1e-12);
        assertEquals(30, window.overlap(1), 1e-12);
        assertEquals(20, window.overlap(2), 1e-12);
        assertEquals(List.of(0, 1, 2), window.unitsInside());
        assertEquals(List.of(1), window.shaleBedsInside());
    }

    @Test
    void distanceToTheNearerCutOff() {
        // shale 50-80: footwall cut-off 20 m above the point (100 - 80), hanging-wall cut-off at 50 + 60 = 110,
        // 10 m below the point: nearer is 10 m (hand calculation)
        assertEquals(10, window.distanceFromCutOff(1), 1e-12);
    }

    @Test
    void windowLeavingTheColumnIsReported() {
        ThrowWindow high = ThrowWindow.of(point(TestColumns.sandShaleSand(), 30, 60));
        assertFalse(high.insideColumn());
        assertThrows(IllegalArgumentException.class, () -> high.requireInsideColumn("SGR"));
        assertThrows(IllegalArgumentException.class, () -> new ThrowWindow(TestColumns.sandShaleSand(), 10, 5));
    }
}
