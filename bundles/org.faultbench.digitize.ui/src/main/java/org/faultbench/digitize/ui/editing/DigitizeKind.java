package org.faultbench.digitize.ui.editing;

/** What a digitizing tool draws; lines end with a double-click, points take one click. */
public enum DigitizeKind {
    CONTOUR("Contour", 2),
    FAULT_TRACE("Fault trace", 2),
    FAULT_POLYGON("Fault polygon", 3),
    FOOTWALL_CUT_OFF("Footwall cut-off", 2),
    HANGING_WALL_CUT_OFF("Hanging-wall cut-off", 2),
    MARKER("Marker", 1),
    WELL("Well", 1),
    CONTROL_POINT("Control point", 1);

    private final String label;
    private final int minimumPoints;

    DigitizeKind(String label, int minimumPoints) {
        this.label = label;
        this.minimumPoints = minimumPoints;
    }

    public String label() {
        return label;
    }

    /** Clicks needed before the feature can be finished. */
    public int minimumPoints() {
        return minimumPoints;
    }

    /** Whether one click makes the feature. */
    public boolean isPoint() {
        return minimumPoints == 1;
    }
}
