package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class FixedValueTest {

    @Test
    void everyCaseReturnsTheValue() {
        UncertainValue value = UncertainValue.fixed(42);
        assertEquals(42, value.nominal(), 0);
        assertEquals(42, value.quantile(0), 0);
        assertEquals(42, value.quantile(1), 0);
        assertEquals(42, value.sample(new Well19937c(1)), 0);
    }

    @Test
    void sampleConsumesOneDrawSoOtherInputsKeepTheirDraws() {
        RandomGenerator rng = new Well19937c(5);
        RandomGenerator twin = new Well19937c(5);
        UncertainValue.fixed(1).sample(rng);
        twin.nextDouble();
        assertEquals(twin.nextDouble(), rng.nextDouble(), 0);
    }

    @Test
    void valueOutsideTheBoundsIsRejectedNamingTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> UncertainValue.fixed(-5).within(Bounds.NON_NEGATIVE, "unit 'A' thickness"));
        assertEquals("unit 'A' thickness: value -5.0 leaves the allowed range [0.0, +inf)", e.getMessage());
        UncertainValue inside = UncertainValue.fixed(0);
        assertSame(inside, inside.within(Bounds.NON_NEGATIVE, "thickness"));
    }

    @Test
    void nonFiniteValuesAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.fixed(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.fixed(Double.NEGATIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.fixed(1).quantile(-0.1));
    }
}
