/**
 * The digitized map sheet: contours, fault traces and polygons, cut-off lines, trap markers and wells drawn on a
 * georeferenced map, with snapping, undoable edits, topology checks and export to the vector formats and gridders.
 * Map coordinates are projected metres; depths are metres, positive downward.
 */
package org.faultbench.digitize.sketch;
