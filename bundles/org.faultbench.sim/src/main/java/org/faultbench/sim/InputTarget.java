package org.faultbench.sim;

/**
 * What a contributed sampled input ({@link SampledInput}) acts on in a realisation. Values act after the built-in
 * inputs are drawn, so the built-in draw for the same quantity stays what it was and both move the result.
 */
public enum InputTarget {
    /** Metres, added to the realisation's common depth shift of the reference horizon (deeper is positive). */
    DEPTH_SHIFT("depth shift, m"),
    /** A factor multiplying every bounding fault's throw scale. */
    THROW_SCALE("throw factor"),
    /**
     * Log10 units added to the seal calibration shift: every threshold pressure is multiplied by 10^(&minus;value),
     * as the built-in calibration shift does.
     */
    THRESHOLD_LOG_SHIFT("threshold-pressure shift, log10"),
    /** Handed to the seal criterion by input id ({@code SealCriterion.forRealisation}); the criterion decides. */
    CRITERION("seal-criterion setting");

    private final String description;

    InputTarget(String description) {
        this.description = description;
    }

    /** Short description for reports and tornado labels. */
    public String description() {
        return description;
    }
}
