package org.faultbench.sim;

import java.util.SplittableRandom;

import org.apache.commons.math3.random.AbstractRandomGenerator;
import org.apache.commons.math3.random.RandomGenerator;

/**
 * The random stream of one realisation, derived from the run's seed and the realisation's index alone. Because no
 * stream is shared between realisations, a run gives bit-identical results whatever the number of threads and
 * whichever thread evaluates which realisation.
 */
public final class RealisationRandom extends AbstractRandomGenerator {
    private SplittableRandom random;

    private RealisationRandom(long streamSeed) {
        random = new SplittableRandom(streamSeed);
    }

    /** The generator of realisation {@code index} of a run seeded with {@code seed}. */
    public static RandomGenerator of(long seed, long index) {
        return new RealisationRandom(mix(mix(seed) ^ index));
    }

    /** Stafford's "Mix13" 64-bit finaliser (as used by SplitMix64): decorrelates neighbouring seeds. */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }

    @Override
    public void setSeed(long seed) {
        random = new SplittableRandom(seed);
        clear();
    }

    @Override
    public double nextDouble() {
        return random.nextDouble();
    }
}
