package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Contour values one interval apart (common practice: a constant contour interval; Tearpock &amp; Bischke 2003). */
class ContourValueStepperTest {

    @Test
    void stepsDeeperAndShallowerByTheInterval() {
        ContourValueStepper stepper = new ContourValueStepper(10);
        double value = 1500;
        value = stepper.next(value, StepDirection.DEEPER);
        assertEquals(1510, value, 0, "hand calculation: 1500 + 10");
        value = stepper.next(value, StepDirection.DEEPER);
        assertEquals(1520, value, 0, "hand calculation: 1510 + 10");
        assertEquals(1490, stepper.next(1500, StepDirection.SHALLOWER), 0, "hand calculation: 1500 - 10");
        assertEquals(10, stepper.interval(), 0);
    }

    @Test
    void decimalIntervalsGiveTheTypedValues() {
        ContourValueStepper stepper = new ContourValueStepper(0.1);
        double value = 1500;
        for (int k = 0; k < 3; k++) {
            value = stepper.next(value, StepDirection.DEEPER);
        }
        // hand calculation: 1500 + 3 x 0.1 = 1500.3 exactly as typed; plain double addition would give 1500.3000000000002
        assertEquals(1500.3, value, 0);
        assertEquals("1500.3", Double.toString(value));
    }

    @Test
    void badIntervalsAreRefused() {
        for (double bad : new double[] { 0, -10, Double.NaN, Double.POSITIVE_INFINITY }) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> new ContourValueStepper(bad));
            assertTrue(e.getMessage().contains("contour interval") && e.getMessage().contains(String.valueOf(bad)),
                    e.getMessage());
        }
        ContourValueStepper stepper = new ContourValueStepper(10);
        assertThrows(IllegalArgumentException.class, () -> stepper.next(Double.NaN, StepDirection.DEEPER));
        assertThrows(IllegalArgumentException.class, () -> stepper.next(1500, null));
    }
}
