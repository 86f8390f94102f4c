package org.faultbench.digitize.gridding;

/** Side of a fault trace on which the footwall lies, looking along the trace from its first to its last point. */
public enum FootwallSide {
    LEFT,
    RIGHT
}
