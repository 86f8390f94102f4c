package org.faultbench.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicInteger;

import org.apache.commons.math3.random.RandomGenerator;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.junit.jupiter.api.Test;

class OrderedParallelRunnerTest {

    /** A stand-in realisation: a few draws combined non-linearly, so any change of stream or order shows. */
    private static double[] block(long seed, int first, int count) {
        double[] values = new double[count];
        for (int k = 0; k < count; k++) {
            RandomGenerator rng = RealisationRandom.of(seed, first + k);
            values[k] = Math.exp(rng.nextDouble()) * rng.nextDouble() - rng.nextDouble();
        }
        return values;
    }

    private static StreamingSummary runWith(int threads) {
        StreamingSummary summary = new StreamingSummary();
        boolean complete = new OrderedParallelRunner(threads, 37).run(5_000, (first, count, cancelled) -> block(99, first, count),
                values -> {
                    for (double v : values) {
                        summary.add(v);
                    }
                }, new NullProgressMonitor());
        assertTrue(complete);
        return summary;
    }

    @Test
    void resultsAreBitIdenticalWhateverTheThreadCount() {
        StreamingSummary one = runWith(1);
        for (int threads : new int[] { 2, 4 }) {
            StreamingSummary many = runWith(threads);
            assertEquals(one.count(), many.count());
            for (ExceedanceLevel level : ExceedanceLevel.values()) {
                assertEquals(Double.doubleToLongBits(one.level(level)), Double.doubleToLongBits(many.level(level)),
                        level + " with " + threads + " threads");
            }
            assertEquals(Double.doubleToLongBits(one.mean()), Double.doubleToLongBits(many.mean()));
        }
    }

    @Test
    void cancellingStopsTheRunEarly() {
        AtomicInteger merged = new AtomicInteger();
        NullProgressMonitor monitor = new NullProgressMonitor();
        boolean complete = new OrderedParallelRunner(2, 10).run(1_000_000, (first, count, cancelled) -> first,
                first -> {
                    if (merged.incrementAndGet() == 5) {
                        monitor.setCanceled(true);
                    }
                }, monitor);
        assertFalse(complete);
        assertEquals(5, merged.get(), "nothing is merged after the cancel request");
    }

    @Test
    void aFailingRealisationSurfacesItsError() {
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> new OrderedParallelRunner(2, 10).run(100, (first, count, cancelled) -> {
                    throw new IllegalStateException("bad realisation " + first);
                }, block -> { }, new NullProgressMonitor()));
        assertTrue(e.getMessage().startsWith("bad realisation"));
    }
}
