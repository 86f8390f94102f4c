package org.faultbench.trap;

import java.util.Arrays;

/** A growable list of node indices without boxing, used as flood stack and tie list. */
final class IntList {
    private int[] items = new int[64];
    private int size;

    void add(int item) {
        if (size == items.length) {
            items = Arrays.copyOf(items, 2 * size);
        }
        items[size++] = item;
    }

    int removeLast() {
        return items[--size];
    }

    int get(int k) {
        return items[k];
    }

    int size() {
        return size;
    }

    boolean isEmpty() {
        return size == 0;
    }

    void clear() {
        size = 0;
    }
}
