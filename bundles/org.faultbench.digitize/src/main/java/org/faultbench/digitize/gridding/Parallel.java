package org.faultbench.digitize.gridding;

import java.util.stream.IntStream;

/**
 * Splits node loops into fixed blocks run on the common fork-join pool. The blocks do not depend on the number of
 * threads and each writes only its own nodes, so results are the same whatever the thread count.
 */
final class Parallel {
    static final int BLOCK = 16_384;

    /** The work on the nodes {@code from} (inclusive) to {@code to} (exclusive). */
    interface RangeTask {
        void run(int from, int to);
    }

    private Parallel() {
    }

    static void forRange(int n, RangeTask task) {
        int blocks = (n + BLOCK - 1) / BLOCK;
        if (blocks <= 1) {
            task.run(0, n);
            return;
        }
        IntStream.range(0, blocks).parallel().forEach(b -> task.run(b * BLOCK, Math.min(n, (b + 1) * BLOCK)));
    }

    /** Runs {@code task} for 0 .. count - 1, in parallel; the tasks must not write what another one reads. */
    static void forEach(int count, java.util.function.IntConsumer task) {
        if (count <= 1) {
            for (int m = 0; m < count; m++) {
                task.accept(m);
            }
            return;
        }
        IntStream.range(0, count).parallel().forEach(task);
    }

    /** Sum of x&middot;y, added block by block in a fixed order so that it does not depend on the thread count. */
    static double dot(double[] x, double[] y) {
        int blocks = (x.length + BLOCK - 1) / BLOCK;
        double[] partial = new double[Math.max(1, blocks)];
        forRange(x.length, (from, to) -> {
            double sum = 0;
            for (int k = from; k < to; k++) {
                sum += x[k] * y[k];
            }
            partial[from / BLOCK] = sum;
        });
        double total = 0;
        for (double p : partial) {
            total += p;
        }
        return total;
    }
}
