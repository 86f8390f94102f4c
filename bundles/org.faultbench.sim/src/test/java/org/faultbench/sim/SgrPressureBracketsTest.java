package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.faultbench.seal.BretanCapacity;
import org.junit.jupiter.api.Test;

class SgrPressureBracketsTest {
    private final BretanCapacity bretan = new BretanCapacity();
    private final SgrPressureBrackets brackets = new SgrPressureBrackets(bretan, 2000);

    @Test
    void twentyPercentSitsOnTheGrid() {
        // SGR 20 % at 2.0 km burial (C = 0.5): 10^(20/27 - 0.5) = 1.7408 bar (Bretan, Yielding & Jones 2003, AAPG
        // Bull. 87; hand calculation)
        int step = brackets.step(20);
        assertTrue(brackets.low(step) <= 1.7409e5 && 1.7407e5 <= brackets.high(step),
                brackets.low(step) + " .. " + brackets.high(step));
        assertEquals(1.7408e5, step == 200 ? brackets.low(step) : brackets.high(step), 0.0001e5);
    }

    @Test
    void stepsAreOneTenthOfAPercentWide() {
        // neighbouring grid points 0.1 % SGR apart differ by the factor 10^(0.1/27) on the Bretan et al. (2003)
        // envelope (hand calculation)
        int step = brackets.step(35.04);
        assertEquals(350, step);
        assertEquals(35.1, brackets.stepEnd(step), 1e-12);
        assertEquals(Math.pow(10, 0.1 / 27), brackets.high(step) / brackets.low(step), 1e-12);
    }

    @Test
    void bracketsHoldTheModelValueEverywhere() {
        SplittableRandom random = new SplittableRandom(3);
        for (int i = 0; i < 100_000; i++) {
            double sgr = i < 1001 ? i / 10.0 : random.nextDouble(0, 100);
            int step = brackets.step(sgr);
            double pressure = bretan.thresholdPressure(sgr, 2000);
            assertTrue(step >= 0 && step < 1000 && sgr <= brackets.stepEnd(step), "SGR " + sgr);
            assertTrue(brackets.low(step) <= pressure && pressure <= brackets.high(step), "SGR " + sgr);
        }
    }

    @Test
    void noStepOutsideZeroToHundredPercent() {
        assertEquals(-1, brackets.step(-1e-12));
        assertEquals(-1, brackets.step(100.000001));
        assertEquals(-1, brackets.step(Double.NaN));
        assertEquals(0, brackets.step(0));
        assertEquals(999, brackets.step(100));
    }
}
