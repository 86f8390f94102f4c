package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.apache.commons.math3.random.RandomGenerator;
import org.junit.jupiter.api.Test;

class RealisationRandomTest {

    @Test
    void aRealisationsStreamDependsOnlyOnSeedAndIndex() {
        RandomGenerator a = RealisationRandom.of(7, 123);
        RandomGenerator b = RealisationRandom.of(7, 123);
        for (int i = 0; i < 100; i++) {
            assertEquals(a.nextDouble(), b.nextDouble(), 0.0);
        }
    }

    @Test
    void neighbouringRealisationsAndSeedsGetDifferentStreams() {
        assertNotEquals(RealisationRandom.of(7, 0).nextDouble(), RealisationRandom.of(7, 1).nextDouble());
        assertNotEquals(RealisationRandom.of(7, 0).nextDouble(), RealisationRandom.of(8, 0).nextDouble());
    }

    @Test
    void drawsAreUniformOnTheUnitInterval() {
        // mean 1/2 and variance 1/12 of U(0,1) (any probability text); tolerance ~ 5 standard errors for 10^5 draws
        RandomGenerator rng = RealisationRandom.of(1, 1);
        int n = 100_000;
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < n; i++) {
            double u = rng.nextDouble();
            sum += u;
            sumSq += u * u;
        }
        double mean = sum / n;
        assertEquals(0.5, mean, 0.005);
        assertEquals(1.0 / 12, sumSq / n - mean * mean, 0.002);
    }
}
