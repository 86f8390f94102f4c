package org.faultbench.core.uncertain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.random.AbstractRandomGenerator;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class UncertainValueTest {

    private static final List<UncertainValue> ALL_KINDS = List.of(UncertainValue.fixed(3),
            UncertainValue.normal(10, 2), UncertainValue.truncatedNormal(0.2, 0.1, 0, 1),
            UncertainValue.uniform(1, 2), UncertainValue.triangular(0, 1, 4), UncertainValue.logNormal(100, 0.5),
            UncertainValue.logNormalFromMeanAndSd(50, 10));

    @Test
    void sameSeedGivesTheSameSamples() {
        for (UncertainValue value : ALL_KINDS) {
            assertArrayEquals(draw(value, 99), draw(value, 99), value.toString());
        }
    }

    @Test
    void eachSampleIsTheQuantileOfOneUniformDraw() {
        for (UncertainValue value : ALL_KINDS) {
            RandomGenerator rng = new Well19937c(17);
            RandomGenerator twin = new Well19937c(17);
            for (int i = 0; i < 100; i++) {
                assertEquals(value.quantile(twin.nextDouble()), value.sample(rng), 0, value.toString());
            }
        }
    }

    @Test
    void aZeroDrawStillGivesAFiniteValue() {
        RandomGenerator zeros = new AbstractRandomGenerator() {
            @Override
            public void setSeed(long seed) {
            }

            @Override
            public double nextDouble() {
                return 0;
            }
        };
        for (UncertainValue value : ALL_KINDS) {
            assertTrue(Double.isFinite(value.sample(zeros)), value.toString());
        }
    }

    private static double[] draw(UncertainValue value, long seed) {
        RandomGenerator rng = new Well19937c(seed);
        double[] values = new double[50];
        for (int i = 0; i < values.length; i++) {
            values[i] = value.sample(rng);
        }
        return values;
    }
}
