package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class NormalValueTest {

    @Test
    void tenthAndNinetiethPercentilesFollowTheStandardNormalTable() {
        UncertainValue value = UncertainValue.normal(100, 10);
        // z(0.90) = 1.28155, standard normal tables (Abramowitz & Stegun 1964, ch. 26; from memory):
        // 100 -/+ 12.8155; these are the industry P90 / P10 (exceedance convention, SPE PRMS)
        assertEquals(87.18, value.quantile(0.10), 0.005);
        assertEquals(112.82, value.quantile(0.90), 0.005);
        assertEquals(100, value.quantile(0.5), 1e-9, "median of a normal is its mean (definition)");
        assertEquals(100, value.nominal(), 0, "nominal of a normal is its mean");
    }

    @Test
    void truncationToNonNegativeGivesTheHalfNormal() {
        UncertainValue halfNormal = UncertainValue.normal(0, 1).within(Bounds.NON_NEGATIVE, "test");
        // Half-normal mean sqrt(2/pi) = 0.797885 (Johnson, Kotz & Balakrishnan 1994, vol. 1, ch. 13; from memory)
        assertEquals(Math.sqrt(2 / Math.PI), halfNormal.nominal(), 1e-9);
        // Median of the half-normal = z(0.75) = 0.67449 (standard normal tables)
        assertEquals(0.67449, halfNormal.quantile(0.5), 1e-5);
        assertEquals(0, halfNormal.quantile(0), 0);
    }

    @Test
    void truncatedNormalSamplesStayInsideItsLimits() {
        UncertainValue value = UncertainValue.truncatedNormal(0.2, 0.3, 0, 0.5);
        RandomGenerator rng = new Well19937c(7);
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < 100_000; i++) {
            double x = value.sample(rng);
            lowest = Math.min(lowest, x);
            highest = Math.max(highest, x);
        }
        assertTrue(lowest >= 0 && highest <= 0.5, "samples in [" + lowest + ", " + highest + "]");
        assertTrue(lowest < 0.01 && highest > 0.49, "both ends reached: [" + lowest + ", " + highest + "]");
        assertEquals(0, value.quantile(0), 0);
        assertEquals(0.5, value.quantile(1), 0);
    }

    @Test
    void openTailsAreCutAtTheBoundsAndTheRestKept() {
        NormalValue cut = (NormalValue) UncertainValue.normal(0.1, 0.2).within(Bounds.FRACTION, "clay fraction");
        assertEquals(new NormalValue(0.1, 0.2, 0, 1), cut);
        assertTrue(cut.isTruncated());
        UncertainValue alreadyInside = UncertainValue.truncatedNormal(0.5, 0.1, 0.2, 0.8);
        assertSame(alreadyInside, alreadyInside.within(Bounds.FRACTION, "clay fraction"));
        assertFalse(((NormalValue) UncertainValue.normal(1, 1)).isTruncated());
    }

    @Test
    void explicitLimitOutsideTheBoundsIsRejectedNamingTheField() {
        UncertainValue value = UncertainValue.truncatedNormal(0.3, 0.1, -0.2, 0.9);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> value.within(Bounds.FRACTION, "unit 'Sand A' porosity"));
        assertTrue(e.getMessage().startsWith("unit 'Sand A' porosity: normal lower limit -0.2"), e.getMessage());
    }

    @Test
    void limitsThatMissTheDistributionAreRejected() {
        // a clay fraction typed in percent: almost nothing of normal(30, 5) lies in [0, 1]
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> UncertainValue.normal(30, 5).within(Bounds.FRACTION, "unit 'Shale' clay fraction"));
        assertTrue(e.getMessage().startsWith("unit 'Shale' clay fraction: normal(mean 30.0, sd 5.0)"), e.getMessage());
        assertTrue(e.getMessage().contains("keep only"), e.getMessage());
    }

    @Test
    void invalidParametersAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.normal(Double.NaN, 1));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.normal(1, Double.POSITIVE_INFINITY));
        IllegalArgumentException zeroSd = assertThrows(IllegalArgumentException.class,
                () -> UncertainValue.normal(1, 0));
        assertEquals("normal standard deviation must be > 0, was 0.0", zeroSd.getMessage());
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.truncatedNormal(1, 1, 2, 2));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.truncatedNormal(1, 1, Double.NaN, 2));
        assertThrows(IllegalArgumentException.class, () -> UncertainValue.normal(1, 1).quantile(1.5));
    }
}
