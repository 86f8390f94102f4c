package org.faultbench.core.grid;

import java.util.Arrays;

/**
 * An immutable yes/no flag per grid node, used for compartments (nodes that belong to a fault block or a trap) and
 * for barriers (nodes a flood may not enter).
 */
public final class GridMask {
    private final GridGeometry geometry;
    private final boolean[] flags;

    private GridMask(GridGeometry geometry, boolean[] ownedFlags) {
        this.geometry = geometry;
        this.flags = ownedFlags;
    }

    /** A mask from one flag per node in row-major order (index = j&middot;nx + i); the array is copied. */
    public static GridMask of(GridGeometry geometry, boolean[] flags) {
        if (geometry == null) {
            throw new IllegalArgumentException("grid geometry is missing");
        }
        if (flags == null || flags.length != geometry.size()) {
            throw new IllegalArgumentException("a " + geometry.nx() + " x " + geometry.ny() + " mask needs "
                    + geometry.size() + " flags, was " + (flags == null ? "none" : flags.length));
        }
        return new GridMask(geometry, flags.clone());
    }

    /** Every node set, e.g. "the whole grid is one compartment". */
    public static GridMask all(GridGeometry geometry) {
        boolean[] flags = new boolean[geometry.size()];
        Arrays.fill(flags, true);
        return new GridMask(geometry, flags);
    }

    /** No node set, e.g. "no barriers". */
    public static GridMask none(GridGeometry geometry) {
        return new GridMask(geometry, new boolean[geometry.size()]);
    }

    public GridGeometry geometry() {
        return geometry;
    }

    /** Whether node (i, j) is set. */
    public boolean contains(int i, int j) {
        return flags[geometry.index(i, j)];
    }

    /** Whether the node with row-major index {@code index} is set. */
    public boolean contains(int index) {
        return flags[index];
    }

    /** Number of nodes set. */
    public int count() {
        int n = 0;
        for (boolean flag : flags) {
            if (flag) {
                n++;
            }
        }
        return n;
    }

    /** The complement: set where this mask is not. */
    public GridMask not() {
        boolean[] result = new boolean[flags.length];
        for (int k = 0; k < flags.length; k++) {
            result[k] = !flags[k];
        }
        return new GridMask(geometry, result);
    }
}
