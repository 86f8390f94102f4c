package org.faultbench.digitize.raster;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;

/**
 * Measures the live heap of a pyramid build: every {@code interval} tiles it forces a collection and reads the
 * used heap from the memory MXBean, keeping the largest value above the baseline taken before the build.
 */
final class HeapSampler implements BuildProgress {
    private final MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
    private final int interval;
    private final long baseline;
    private long peak;
    private int samples;

    HeapSampler(int interval) {
        this.interval = interval;
        this.baseline = liveHeap();
    }

    @Override
    public void tilesDone(int done, int total) {
        if (done % interval == 0 || done == total) {
            peak = Math.max(peak, liveHeap() - baseline);
            samples++;
        }
    }

    @Override
    public boolean isCancelled() {
        return false;
    }

    /** Largest live heap above the baseline seen at a sample, in bytes. */
    long peakAboveBaseline() {
        return peak;
    }

    int samples() {
        return samples;
    }

    private long liveHeap() {
        System.gc();
        return memory.getHeapMemoryUsage().getUsed();
    }
}
