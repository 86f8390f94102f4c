package org.faultbench.core.scale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Round steps and their multiples. The 1-2-5 rule is Heckbert's (1990, Graphics Gems, 61&ndash;63; from memory);
 * 2.5 is the report charts' addition (common practice on depth axes: 25 m contours). Expected values by hand.
 */
class RoundStepsTest {

    @Test
    void oneTwoFiveSteps() {
        assertEquals(0.5, RoundSteps.atLeast(0.37, 1, 2, 5), 1e-15);
        assertEquals(10, RoundSteps.atLeast(7, 1, 2, 5), 1e-12);
        assertEquals(1000, RoundSteps.atLeast(1000, 1, 2, 5), 1e-9);
        assertEquals(2000, RoundSteps.atLeast(1001, 1, 2, 5), 1e-9);
        assertEquals(0.02, RoundSteps.atLeast(0.015, 1, 2, 5), 1e-15);
    }

    @Test
    void twoAndAHalfWhenOffered() {
        assertEquals(25, RoundSteps.atLeast(22, 1, 2, 2.5, 5), 1e-12);
        assertEquals(50, RoundSteps.atLeast(22, 1, 2, 5), 1e-12);
        assertEquals(5, RoundSteps.atLeast(3, 1, 2, 2.5, 5), 1e-12);
    }

    @Test
    void aRangeWithoutLengthGetsAUnitStep() {
        assertEquals(1, RoundSteps.atLeast(0, 1, 2, 5));
        assertEquals(1, RoundSteps.atLeast(Double.NaN, 1, 2, 5));
        assertEquals(1, RoundSteps.atLeast(Double.POSITIVE_INFINITY, 1, 2, 5));
    }

    @Test
    void multiplesKeepBothEndsAndAnExactZero() {
        List<Double> ticks = RoundSteps.multiples(-0.3, 1.0, 0.1);
        assertEquals(14, ticks.size(), ticks.toString());
        assertEquals(-0.3, ticks.get(0), 1e-12);
        assertEquals(1.0, ticks.get(ticks.size() - 1), 1e-12);
        // 3 * 0.1 - 0.3 is 5.5e-17 in floating point; a tick must read 0
        assertEquals(0.0, ticks.get(3));
        assertEquals(List.of(1500.0, 1525.0, 1550.0), RoundSteps.multiples(1490, 1550, 25));
    }

    @Test
    void aStepThatIsNotPositiveIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> RoundSteps.multiples(0, 1, 0));
        assertThrows(IllegalArgumentException.class, () -> RoundSteps.multiples(0, 1, Double.NaN));
    }
}
