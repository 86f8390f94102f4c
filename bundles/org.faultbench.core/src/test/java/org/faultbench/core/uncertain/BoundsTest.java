package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class BoundsTest {

    @Test
    void containsIsClosedAtBothEnds() {
        assertTrue(Bounds.FRACTION.contains(0));
        assertTrue(Bounds.FRACTION.contains(1));
        assertFalse(Bounds.FRACTION.contains(1.0001));
        assertFalse(Bounds.NON_NEGATIVE.contains(-1e-9));
        assertFalse(Bounds.UNBOUNDED.contains(Double.NaN));
        assertTrue(Bounds.atLeast(1).contains(1));
    }

    @Test
    void describesItselfForMessages() {
        assertEquals("[0.0, 1.0]", Bounds.FRACTION.toString());
        assertEquals("[0.0, +inf)", Bounds.NON_NEGATIVE.toString());
        assertEquals("(-inf, +inf)", Bounds.UNBOUNDED.toString());
    }

    @Test
    void invalidBoundsAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> new Bounds(1, 0));
        assertThrows(IllegalArgumentException.class, () -> new Bounds(Double.NaN, 0));
    }
}
