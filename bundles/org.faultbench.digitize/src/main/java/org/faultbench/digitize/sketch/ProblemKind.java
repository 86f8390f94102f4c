package org.faultbench.digitize.sketch;

/** The topology problems {@link TopologyChecker} looks for. */
public enum ProblemKind {
    /** Contours of different depth on one horizon cross or touch. */
    CONTOURS_CROSS(Severity.ERROR),
    /** A contour crosses or touches itself. */
    CONTOUR_CROSSES_ITSELF(Severity.ERROR),
    /** A fault polygon's last point is further from its first than the closure tolerance. */
    FAULT_POLYGON_OPEN(Severity.ERROR),
    /** A closed fault polygon is not a valid polygon (self-intersecting or collapsed outline). */
    FAULT_POLYGON_INVALID(Severity.ERROR),
    /** A cut-off lies on the other wall's side of its fault trace. */
    CUT_OFF_ON_WRONG_WALL(Severity.ERROR),
    /** A contour runs on through a fault trace or into a fault polygon instead of ending there. */
    CONTOUR_CROSSES_FAULT(Severity.WARNING);

    private final Severity severity;

    ProblemKind(Severity severity) {
        this.severity = severity;
    }

    public Severity severity() {
        return severity;
    }
}
