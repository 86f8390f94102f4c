package org.faultbench.juxtaposition.svg;

/**
 * A labelled horizontal line across the Allan diagram (a contact at P90/P50/P10, a drainage depth).
 *
 * @param label what the line is, e.g. "Sand A contact P50"; the depth is appended when drawn
 * @param z depth, m TVDSS, positive down; lines outside the diagram or not finite are left out
 * @param rgb colour as 0xRRGGBB
 * @param dashed dashed rather than solid
 */
public record SvgDepthLine(String label, double z, int rgb, boolean dashed) {
}
