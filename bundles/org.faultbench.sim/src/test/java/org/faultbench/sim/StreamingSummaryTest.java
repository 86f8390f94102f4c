package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.random.RandomGenerator;
import org.junit.jupiter.api.Test;

class StreamingSummaryTest {

    @Test
    void exceedanceLevelsOfNormal100Sd10() {
        NormalDistribution normal = new NormalDistribution(100, 10);
        RandomGenerator rng = RealisationRandom.of(2026, 0);
        StreamingSummary summary = new StreamingSummary();
        for (int i = 0; i < 200_000; i++) {
            summary.add(normal.inverseCumulativeProbability(rng.nextDouble()));
        }
        // PRMS exceedance convention with z(0.90) = 1.28155 (standard normal tables): P90 87.18, P50 100, P10 112.82.
        // Tolerance: sampling error of a percentile sqrt(p(1-p)/N)/f(x_p) ~ 0.04 plus the P2 estimator's own error
        // (Jain & Chlamtac 1985).
        assertEquals(87.18, summary.level(ExceedanceLevel.P90), 0.15);
        assertEquals(100.00, summary.level(ExceedanceLevel.P50), 0.15);
        assertEquals(112.82, summary.level(ExceedanceLevel.P10), 0.15);
        assertEquals(100.0, summary.mean(), 0.1);
        assertTrue(summary.level(ExceedanceLevel.P90) < summary.level(ExceedanceLevel.P10), "P90 is the low case");
    }

    @Test
    void nonFiniteValuesAreCountedApart() {
        StreamingSummary summary = new StreamingSummary();
        summary.add(Double.POSITIVE_INFINITY);
        assertTrue(Double.isNaN(summary.level(ExceedanceLevel.P50)), "no finite value yet");
        summary.add(10);
        summary.add(20);
        summary.add(Double.POSITIVE_INFINITY);
        assertEquals(4, summary.count());
        assertEquals(0.5, summary.finiteFraction(), 1e-12);
        assertEquals(15, summary.mean(), 1e-12);
        assertEquals(10, summary.min(), 0);
        assertEquals(20, summary.max(), 0);
    }
}
