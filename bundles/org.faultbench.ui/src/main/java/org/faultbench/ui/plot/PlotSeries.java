package org.faultbench.ui.plot;

import org.eclipse.swt.graphics.RGB;

/**
 * A named set of points drawn as a line, as symbols, as vertical marker lines at each x (the y values are then
 * ignored), or as bars from zero up to each y centred on each x and reaching halfway to the neighbouring x values
 * (histograms: x the bin centres), in one colour; dashed lines for models and references, solid for data.
 */
public record PlotSeries(String name, double[] x, double[] y, RGB colour, Style style) {

    public enum Style {
        LINE, DASHED_LINE, POINTS, VERTICAL_MARKERS, BARS
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
