package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class BretanCapacityTest {

    private final BretanCapacity bretan = new BretanCapacity();

    @Test
    void publishedEnvelopeValues() {
        // Bretan, Yielding & Jones 2003, AAPG Bull. 87, FZP (bar) = 10^(SGR/27 - C); hand calculation:
        // SGR 20 %, 2.0 km, C 0.5: 10^(0.74074 - 0.5) = 1.7408 bar
        assertEquals(1.7408e5, bretan.thresholdPressure(20, 2000), 0.00005e5);
        // SGR 20 %, 3.2 km, C 0.25: 3.0956 bar
        assertEquals(3.0956e5, bretan.thresholdPressure(20, 3200), 0.00005e5);
        // SGR 20 %, 4.0 km, C 0: 5.5048 bar
        assertEquals(5.5048e5, bretan.thresholdPressure(20, 4000), 0.00005e5);
        // SGR 27 %, C 0.5: 10^0.5 = 3.1623 bar
        assertEquals(3.1623e5, bretan.thresholdPressure(27, 2000), 0.00005e5);
        // SGR 40 %, C 0.5: 9.5826 bar
        assertEquals(9.5826e5, bretan.thresholdPressure(40, 2000), 0.00005e5);
    }

    @Test
    void depthBands() {
        // C = 0.5 shallower than 3.0 km, 0.25 for 3.0-3.5 km, 0 deeper (Bretan et al. 2003; bands from memory)
        assertEquals(0.5, BretanCapacity.depthConstant(2999.9), 0);
        assertEquals(0.25, BretanCapacity.depthConstant(3000), 0);
        assertEquals(0.25, BretanCapacity.depthConstant(3500), 0);
        assertEquals(0, BretanCapacity.depthConstant(3500.1), 0);
    }

    @Test
    void invalidInputsAreRejected() {
        IllegalArgumentException sgr = assertThrows(IllegalArgumentException.class,
                () -> bretan.thresholdPressure(120, 2000));
        assertEquals("SGR must be in [0, 100] %, was 120.0", sgr.getMessage());
        assertThrows(IllegalArgumentException.class, () -> bretan.thresholdPressure(20, -1));
        assertThrows(IllegalArgumentException.class, () -> bretan.thresholdPressure(Double.NaN, 2000));
    }
}
