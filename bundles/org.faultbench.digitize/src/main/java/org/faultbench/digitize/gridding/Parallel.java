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

    /**
     * The dot products of {@code x} with the first {@code count} vectors of {@code basis}, then x&middot;x (entry
     * {@code count}), in one sweep over the vectors, added block by block in a fixed order as {@link #dot}.
     */
    static double[] dots(double[] x, double[][] basis, int count) {
        double[][] partial = new double[blocks(x.length)][];
        forRange(x.length, (from, to) -> {
            double[] sums = new double[count + 1];
            for (int i = 0; i <= count; i++) {
                double[] v = i < count ? basis[i] : x;
                double sum = 0;
                for (int k = from; k < to; k++) {
                    sum += x[k] * v[k];
                }
                sums[i] = sum;
            }
            partial[from / BLOCK] = sums;
        });
        return sumInOrder(partial, count + 1);
    }

    /**
     * x &minus;= &Sigma; factor[i] basis[i] over the first {@code count} vectors, in one sweep.
     *
     * @return x&middot;x afterwards
     */
    static double subtractCombination(double[] x, double[][] basis, double[] factor, int count) {
        double[][] partial = new double[blocks(x.length)][];
        forRange(x.length, (from, to) -> {
            for (int i = 0; i < count; i++) {
                double[] v = basis[i];
                double f = factor[i];
                for (int k = from; k < to; k++) {
                    x[k] -= f * v[k];
                }
            }
            double sum = 0;
            for (int k = from; k < to; k++) {
                sum += x[k] * x[k];
            }
            partial[from / BLOCK] = new double[] { sum };
        });
        return sumInOrder(partial, 1)[0];
    }

    private static int blocks(int n) {
        return Math.max(1, (n + BLOCK - 1) / BLOCK);
    }

    private static double[] sumInOrder(double[][] partial, int size) {
        double[] total = new double[size];
        for (double[] p : partial) {
            if (p != null) {
                for (int i = 0; i < size; i++) {
                    total[i] += p[i];
                }
            }
        }
        return total;
    }

    /** Sum of x&middot;y, added block by block in a fixed order so that it does not depend on the thread count. */
    static double dot(double[] x, double[] y) {
        double[] partial = new double[blocks(x.length)];
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
