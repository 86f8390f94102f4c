package org.faultbench.digitize.georef;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ControlPointTest {

    @Test
    void ofMakesAnEnabledPointAndWithEnabledSwitchesItOff() {
        ControlPoint point = ControlPoint.of("P1", 10.5, 20.25, 500000, 6000000);
        assertTrue(point.enabled());
        ControlPoint off = point.withEnabled(false);
        assertFalse(off.enabled());
        assertEquals(new ControlPoint("P1", 10.5, 20.25, 500000, 6000000, false), off);
    }

    @Test
    void emptyIdIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ControlPoint.of(" ", 0, 0, 0, 0));
        assertTrue(e.getMessage().contains("id is empty"), e.getMessage());
    }

    @Test
    void nonFiniteCoordinateIsRejectedNamingThePointAndTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ControlPoint.of("P7", 0, 0, Double.NaN, 6000000));
        assertTrue(e.getMessage().contains("'P7'") && e.getMessage().contains("map x")
                && e.getMessage().contains("NaN"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> ControlPoint.of("P8", 0, Double.POSITIVE_INFINITY, 0, 0));
        assertTrue(e.getMessage().contains("'P8'") && e.getMessage().contains("pixel row"), e.getMessage());
    }
}
