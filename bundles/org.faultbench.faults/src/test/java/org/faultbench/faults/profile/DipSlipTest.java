package org.faultbench.faults.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class DipSlipTest {

    @Test
    void displacementAndHeaveFollowFromThrowAndDip() {
        // dip-slip geometry D = T / sin(dip), H = T / tan(dip) (common practice); hand calculation:
        // dip 30 degrees: sin = 0.5, so 100 m throw is 200 m displacement; tan(63.4349 deg) = 2, so heave 50 m
        assertEquals(200, DipSlip.displacement(100, 30), 1e-9);
        assertEquals(50, DipSlip.heave(100, Math.toDegrees(Math.atan(2))), 1e-9);
        assertEquals(0, DipSlip.heave(100, 90), 0, "vertical fault has no heave");
        assertEquals(100, DipSlip.displacement(100, 90), 1e-9);
    }

    @Test
    void dipOutsideTheRangeIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> DipSlip.heave(100, 0));
        assertThrows(IllegalArgumentException.class, () -> DipSlip.displacement(100, 95));
    }
}
