package org.faultbench.sim;

import org.apache.commons.math3.random.AbstractRandomGenerator;

/** Test generator that counts its draws and always returns the median 0.5, so every sampled input is valid. */
final class CountingUniforms extends AbstractRandomGenerator {
    int draws;

    @Override
    public void setSeed(long seed) {
        // no state to reset besides the count, which the tests read
    }

    @Override
    public double nextDouble() {
        draws++;
        return 0.5;
    }
}
