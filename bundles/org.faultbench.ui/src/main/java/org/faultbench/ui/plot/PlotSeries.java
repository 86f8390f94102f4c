package org.faultbench.ui.plot;

import org.eclipse.swt.graphics.RGB;

/**
 * A named set of points drawn as a line, as symbols, or as vertical marker lines at each x (the y values are then
 * ignored), in one colour; dashed lines for models and references, solid for data.
 */
public record PlotSeries(String name, double[] x, double[] y, RGB colour, Style style) {

    public enum Style {
        LINE, DASHED_LINE, POINTS, VERTICAL_MARKERS
    }

    public PlotSeries {
        if (x.length != y.length) {
            throw new IllegalArgumentException("series '" + name + "': " + x.length + " x values but " + y.length
                    + " y values");
        }
        x = x.clone();
        y = y.clone();
    }
}
