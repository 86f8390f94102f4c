package org.faultbench.faults;

/** The two fault blocks: the footwall lies below the fault plane, the hanging wall above it, on the dip side. */
public enum Wall {
    FOOTWALL,
    HANGING_WALL
}
