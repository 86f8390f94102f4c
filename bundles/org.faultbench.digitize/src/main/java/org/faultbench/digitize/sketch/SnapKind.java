package org.faultbench.digitize.sketch;

/** What a digitized point was snapped to. */
public enum SnapKind {
    /** An existing vertex within the vertex tolerance. */
    VERTEX,
    /** The nearest point of an existing segment within the segment tolerance. */
    SEGMENT,
    /** Nothing near enough: the point is kept as clicked. */
    NONE
}
