package org.faultbench.digitize.importer;

/** What an importer produces; the workbench routes each kind to its own place (grids, map points, lines, wells). */
public enum DataKind {
    /** A regular grid (depth or isochore). */
    GRID,
    /** Scattered x, y, z points. */
    POINTS,
    /** Lines and polygons (fault traces, outlines, contours). */
    LINES,
    /** Well tops: surface picks per well. */
    TOPS,
    /** A well log. */
    LOG
}
