package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class UniformValueTest {

    @Test
    void quantileIsLinearAndNominalIsTheMidpoint() {
        UncertainValue value = UncertainValue.uniform(10, 30);
        // uniform inverse CDF a + p (b - a) (definition)
        assertEquals(10, value.quantile(0), 0);
        assertEquals(15, value.quantile(0.25), 1e-12);
        assertEquals(30, value.quantile(1), 0);
        assertEquals(20, value.nominal(), 0);
    }

    @Test
    void rangeMustFitTheBounds() {
        UncertainValue inside = UncertainValue.uniform(0.1, 0.3);
        assertSame(inside, inside.within(Bounds.FRACTION, "porosity"));
        assertThrows(IllegalArgumentException.class,
                () -> UncertainValue.uniform(0.5, 1.2).within(Bounds.FRACTION, "porosity"));
    }

    @Test
    void invalidParametersAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.uniform(3, 3));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.uniform(Double.NaN, 3));
    }
}
