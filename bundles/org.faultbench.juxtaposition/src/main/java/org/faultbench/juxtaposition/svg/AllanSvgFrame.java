package org.faultbench.juxtaposition.svg;

/**
 * Where the fault plane lands on the SVG page: the plotted extent along strike (u) and in depth (z, down the page)
 * and the plotting rectangle in SVG user units. The writer and its tests use the same transform.
 *
 * @param uMin left edge, m along strike
 * @param uMax right edge, m along strike
 * @param zTop top edge, m TVDSS
 * @param zBase bottom edge, m TVDSS
 */
public record AllanSvgFrame(double uMin, double uMax, double zTop, double zBase) {
    /** Plotting rectangle on the page, SVG user units (px). */
    public static final double LEFT = 80;
    public static final double TOP = 40;
    public static final double PLOT_WIDTH = 760;
    public static final double PLOT_HEIGHT = 440;
    /** Page size: the plot with room for tick labels, titles and a two-line legend. */
    public static final double PAGE_WIDTH = LEFT + PLOT_WIDTH + 30;
    public static final double PAGE_HEIGHT = TOP + PLOT_HEIGHT + 130;

    public AllanSvgFrame {
        if (!(uMax > uMin) || !(zBase > zTop)) {
            throw new IllegalArgumentException("the Allan diagram extent is empty: u [" + uMin + ", " + uMax
                    + "], z [" + zTop + ", " + zBase + "]");
        }
    }

    /** Page x of along-strike distance {@code u}. */
    public double x(double u) {
        return LEFT + PLOT_WIDTH * (u - uMin) / (uMax - uMin);
    }

    /** Page y of depth {@code z} (deeper is lower on the page). */
    public double y(double z) {
        return TOP + PLOT_HEIGHT * (z - zTop) / (zBase - zTop);
    }

    boolean containsDepth(double z) {
        return Double.isFinite(z) && z >= zTop && z <= zBase;
    }
}
