package org.faultbench.digitize.sketch;

/** Side of a fault trace, looking along it from its first to its last point. */
public enum TraceSide {
    LEFT,
    RIGHT;

    public TraceSide opposite() {
        return this == LEFT ? RIGHT : LEFT;
    }
}
