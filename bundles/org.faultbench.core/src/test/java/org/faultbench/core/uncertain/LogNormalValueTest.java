package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.LogNormalDistribution;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class LogNormalValueTest {

    @Test
    void percentilesFromMedianAndSigma() {
        UncertainValue value = UncertainValue.logNormal(100, 0.5);
        // 100 exp(-/+ 0.5 x 1.28155), z(0.90) from standard normal tables; hand calculation
        assertEquals(52.69, value.quantile(0.10), 0.005);
        assertEquals(189.80, value.quantile(0.90), 0.005);
        assertEquals(100, value.quantile(0.5), 1e-8, "median by definition");
    }

    @Test
    void nominalIsTheMeanAboveTheMedian() {
        // lognormal mean = median exp(sigma^2 / 2) (Aitchison & Brown 1957; from memory): 100 exp(0.125) = 113.3148
        assertEquals(113.3148, UncertainValue.logNormal(100, 0.5).nominal(), 1e-4);
    }

    @Test
    void meanAndSdFactoryMatchesTheMomentRelations() {
        LogNormalValue value = LogNormalValue.ofMeanAndSd(100, 50);
        // sigma^2 = ln(1 + 0.5^2) = 0.223144, median = 100 / sqrt(1.25) = 89.4427 (Aitchison & Brown 1957; hand calc)
        assertEquals(Math.sqrt(0.223144), value.sigmaLn(), 1e-6);
        assertEquals(89.4427, value.median(), 1e-4);
        assertEquals(100, value.nominal(), 1e-9);
    }

    @Test
    void truncationToBoundsCutsTheTails() {
        UncertainValue bo = UncertainValue.logNormal(1.2, 0.1).within(Bounds.atLeast(1), "Bo");
        assertEquals(new LogNormalValue(1.2, 0.1, 1, Double.POSITIVE_INFINITY), bo);
        assertEquals(1, bo.quantile(0), 0);
        UncertainValue fraction = UncertainValue.logNormal(0.2, 0.8).within(Bounds.FRACTION, "porosity");
        RandomGenerator rng = new Well19937c(3);
        for (int i = 0; i < 20_000; i++) {
            double x = fraction.sample(rng);
            assertTrue(x > 0 && x <= 1, "sample " + x);
        }
    }

    @Test
    void truncatedMeanMatchesNumericalIntegration() {
        LogNormalValue value = new LogNormalValue(100, 0.5, 60, 150);
        LogNormalDistribution density = new LogNormalDistribution(Math.log(100), 0.5);
        // mean of a truncated density = integral of x f(x) over the limits / retained mass (definition),
        // integrated here by the midpoint rule
        int steps = 100_000;
        double dx = (150.0 - 60.0) / steps;
        double moment = 0;
        for (int i = 0; i < steps; i++) {
            double x = 60 + (i + 0.5) * dx;
            moment += x * density.density(x) * dx;
        }
        double mass = density.cumulativeProbability(150) - density.cumulativeProbability(60);
        assertEquals(moment / mass, value.nominal(), 1e-6);
    }

    @Test
    void explicitLimitOutsideTheBoundsIsRejected() {
        UncertainValue value = new LogNormalValue(0.2, 0.5, 0, 1.5);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> value.within(Bounds.FRACTION, "unit 'B' porosity"));
        assertTrue(e.getMessage().startsWith("unit 'B' porosity: lognormal upper limit 1.5"), e.getMessage());
    }

    @Test
    void invalidParametersAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.logNormal(0, 0.5));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.logNormal(100, -0.5));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.logNormal(Double.NaN, 0.5));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.logNormalFromMeanAndSd(100, 0));
        assertThrows(IllegalArgumentException.class, () -> new LogNormalValue(100, 0.5, -1, 200));
        assertThrows(IllegalArgumentException.class, () -> new LogNormalValue(100, 0.5, 200, 100));
    }
}
