package org.faultbench.sim;

/**
 * How a Monte Carlo run is carried out.
 *
 * @param realisations number of realisations
 * @param seed random seed; the same seed gives bit-identical results whatever the thread count
 * @param threads worker threads
 * @param cellHeight height of the fault-plane cells on which leak probability is counted and fault rock sampled, m
 */
public record SimulationSettings(int realisations, long seed, int threads, double cellHeight) {
    public static final double DEFAULT_CELL_HEIGHT = 5;

    public SimulationSettings {
        if (realisations < 1) {
            throw new IllegalArgumentException("realisations must be at least 1, was " + realisations);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
        if (!(cellHeight > 0) || Double.isInfinite(cellHeight)) {
            throw new IllegalArgumentException("cell height must be a finite number > 0 m, was " + cellHeight);
        }
    }

    public static SimulationSettings of(int realisations, long seed) {
        return new SimulationSettings(realisations, seed, Runtime.getRuntime().availableProcessors(),
                DEFAULT_CELL_HEIGHT);
    }
}
