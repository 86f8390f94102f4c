package org.faultbench.digitize.sketch;

/** What a point marker on the map stands for in the trap analysis. */
public enum MarkerKind {
    /** Shallowest point of the closure. */
    CREST("crest"),
    /** Where hydrocarbons escape past the closing contour. */
    SPILL("spill point"),
    /** Where hydrocarbons escape across or along a fault. */
    LEAK("leak point");

    private final String label;

    MarkerKind(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
