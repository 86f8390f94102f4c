package org.faultbench.juxtaposition;

import java.util.Arrays;

/**
 * Reusable output buffer for the juxtaposition of one fault-plane column: depth intervals [top, base), shallowest
 * first, each with the footwall and hanging-wall unit facing each other there. Kept in primitive arrays and refilled
 * in place, so Monte Carlo loops (columns x faults x realisations) allocate nothing per interval.
 */
public final class ColumnIntervals {

    private static final int INITIAL_CAPACITY = 16;
    private static final JuxtapositionClass[] CLASSES = JuxtapositionClass.values();

    private double[] top = new double[INITIAL_CAPACITY];
    private double[] base = new double[INITIAL_CAPACITY];
    private int[] footwallUnit = new int[INITIAL_CAPACITY];
    private int[] hangingWallUnit = new int[INITIAL_CAPACITY];
    /** Ordinals, not references: storing a reference costs a garbage-collector write barrier in the hot loop. */
    private byte[] classes = new byte[INITIAL_CAPACITY];
    private int count;

    /** Empties the buffer, growing it (the only allocation) if it cannot hold {@code capacity} intervals. */
    void reset(int capacity) {
        if (capacity > top.length) {
            top = Arrays.copyOf(top, capacity);
            base = Arrays.copyOf(base, capacity);
            footwallUnit = Arrays.copyOf(footwallUnit, capacity);
            hangingWallUnit = Arrays.copyOf(hangingWallUnit, capacity);
            classes = Arrays.copyOf(classes, capacity);
        }
        count = 0;
    }

    void add(double intervalTop, double intervalBase, int footwall, int hangingWall, JuxtapositionClass juxtaposition) {
        top[count] = intervalTop;
        base[count] = intervalBase;
        footwallUnit[count] = footwall;
        hangingWallUnit[count] = hangingWall;
        classes[count++] = (byte) juxtaposition.ordinal();
    }

    public int count() {
        return count;
    }

    /** Depth of the top of interval {@code n} (positive down, m). */
    public double top(int n) {
        return top[n];
    }

    /** Depth of the base of interval {@code n}; the interval is [top, base). */
    public double base(int n) {
        return base[n];
    }

    public double length(int n) {
        return base[n] - top[n];
    }

    /** Footwall unit index in interval {@code n}: -1 overburden, size() underburden. */
    public int footwallUnit(int n) {
        return footwallUnit[n];
    }

    /** Hanging-wall unit index in interval {@code n}: -1 overburden, size() underburden. */
    public int hangingWallUnit(int n) {
        return hangingWallUnit[n];
    }

    public JuxtapositionClass juxtapositionClass(int n) {
        return CLASSES[classes[n]];
    }
}
