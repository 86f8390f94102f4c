package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class TriangularValueTest {

    private final UncertainValue value = UncertainValue.triangular(1, 2, 6);

    @Test
    void nominalIsTheMeanAndMatchesTheSampleMean() {
        // triangular mean (a + b + c) / 3 = 3 (Kotz & van Dorp 2004, Beyond Beta, ch. 1; from memory)
        assertEquals(3, value.nominal(), 1e-12);
        RandomGenerator rng = new Well19937c(11);
        int n = 200_000;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += value.sample(rng);
        }
        // sd = sqrt((1 + 4 + 36 - 2 - 6 - 12) / 18) = 1.080, standard error 0.0024: allow 5 standard errors
        assertEquals(3, sum / n, 0.012);
    }

    @Test
    void quantilesFollowTheExactInverseCdf() {
        // F^-1(p) = a + sqrt(p (c - a)(m - a)) for p < (m - a)/(c - a) = 0.2, else c - sqrt((1 - p)(c - a)(c - m))
        // (Kotz & van Dorp 2004, ch. 1; from memory); hand calculation
        assertEquals(1 + Math.sqrt(0.1 * 5 * 1), value.quantile(0.1), 1e-12);
        assertEquals(2, value.quantile(0.2), 1e-12);
        assertEquals(6 - Math.sqrt(0.5 * 5 * 4), value.quantile(0.5), 1e-12);
        assertEquals(1, value.quantile(0), 0);
        assertEquals(6, value.quantile(1), 0);
    }

    @Test
    void rangeOutsideTheBoundsIsRejectedNamingTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> UncertainValue.triangular(-1, 2, 5).within(Bounds.NON_NEGATIVE, "unit 'S' thickness"));
        assertTrue(e.getMessage().startsWith("unit 'S' thickness: triangular range [-1.0, 5.0]"), e.getMessage());
    }

    @Test
    void invalidParametersAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.triangular(1, 7, 6));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.triangular(1, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.triangular(1, 2, Double.POSITIVE_INFINITY));
    }
}
