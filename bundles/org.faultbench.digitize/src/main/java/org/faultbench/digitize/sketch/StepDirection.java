package org.faultbench.digitize.sketch;

/** Which way the next contour goes; depth is positive downward, so deeper means a larger value. */
public enum StepDirection {
    DEEPER,
    SHALLOWER
}
