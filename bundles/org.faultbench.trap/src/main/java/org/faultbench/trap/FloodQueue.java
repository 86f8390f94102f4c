package org.faultbench.trap;

import java.util.Arrays;

/**
 * Binary min-heap of flood entries (fill level, node, saddle node) kept in primitive arrays, so that a flood over
 * 10^5 to 10^6 nodes, run thousands of times in Monte Carlo, creates no object per node.
 */
final class FloodQueue {
    private double[] levels;
    private int[] nodes;
    private int[] saddles;
    private int size;

    FloodQueue(int initialCapacity) {
        int capacity = Math.max(1, initialCapacity);
        levels = new double[capacity];
        nodes = new int[capacity];
        saddles = new int[capacity];
    }

    boolean isEmpty() {
        return size == 0;
    }

    void push(double level, int node, int saddle) {
        if (size == levels.length) {
            levels = Arrays.copyOf(levels, 2 * size);
            nodes = Arrays.copyOf(nodes, 2 * size);
            saddles = Arrays.copyOf(saddles, 2 * size);
        }
        int k = size++;
        while (k > 0) {
            int parent = (k - 1) >>> 1;
            if (levels[parent] <= level) {
                break;
            }
            move(parent, k);
            k = parent;
        }
        set(k, level, node, saddle);
    }

    double peekLevel() {
        return levels[0];
    }

    int peekNode() {
        return nodes[0];
    }

    int peekSaddle() {
        return saddles[0];
    }

    /** Removes the entry with the lowest level. */
    void pop() {
        size--;
        if (size == 0) {
            return;
        }
        double level = levels[size];
        int node = nodes[size];
        int saddle = saddles[size];
        int k = 0;
        int child;
        while ((child = 2 * k + 1) < size) {
            if (child + 1 < size && levels[child + 1] < levels[child]) {
                child++;
            }
            if (level <= levels[child]) {
                break;
            }
            move(child, k);
            k = child;
        }
        set(k, level, node, saddle);
    }

    private void move(int from, int to) {
        set(to, levels[from], nodes[from], saddles[from]);
    }

    private void set(int k, double level, int node, int saddle) {
        levels[k] = level;
        nodes[k] = node;
        saddles[k] = saddle;
    }
}
