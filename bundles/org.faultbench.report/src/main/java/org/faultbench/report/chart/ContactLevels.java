package org.faultbench.report.chart;

/**
 * One reservoir unit's contact depths to draw (m TVDSS, exceedance convention: P90 = low case = shallowest
 * contact); a non-finite level is left out.
 *
 * @param unit index of the unit in the stratigraphic column
 * @param name unit name for the label
 */
public record ContactLevels(int unit, String name, double p90, double p50, double p10) {
}
