package org.faultbench.ui.plot;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.scale.RoundSteps;

/**
 * One axis of a plot: its title, range and scale (linear or base-10 logarithmic), and the tick values a reader
 * expects: 1, 2 or 5 times a power of ten on a linear axis, the decades on a log axis.
 */
public record PlotAxis(String title, double min, double max, boolean logarithmic) {

    public PlotAxis {
        if (!(max > min) || (logarithmic && min <= 0)) {
            throw new IllegalArgumentException("axis '" + title + "': range [" + min + ", " + max + "] is empty"
                    + (logarithmic ? " or not positive" : ""));
        }
    }

    /** A linear axis over the data with a little room on either side and round ends. */
    public static PlotAxis linear(String title, double dataMin, double dataMax) {
        double lo = dataMin;
        double hi = dataMax;
        if (!(hi > lo)) {
            lo -= 1;
            hi += 1;
        }
        double step = niceStep((hi - lo) / 6);
        return new PlotAxis(title, Math.floor(lo / step) * step, Math.ceil(hi / step) * step, false);
    }

    /** A log axis over whole decades covering the data. */
    public static PlotAxis log(String title, double dataMin, double dataMax) {
        double lo = Math.pow(10, Math.floor(Math.log10(dataMin)));
        double hi = Math.pow(10, Math.ceil(Math.log10(dataMax)));
        return new PlotAxis(title, lo, hi > lo ? hi : lo * 10, true);
    }

    /** Position of {@code value} along the axis, 0 at min and 1 at max. */
    public double fraction(double value) {
        return logarithmic ? (Math.log10(value) - Math.log10(min)) / (Math.log10(max) - Math.log10(min))
                : (value - min) / (max - min);
    }

    public List<Double> ticks() {
        if (logarithmic) {
            List<Double> ticks = new ArrayList<>();
            for (double v = min; v <= max * 1.000001; v *= 10) {
                ticks.add(v);
            }
            return ticks;
        }
        return RoundSteps.multiples(min, max, niceStep((max - min) / 6));
    }

    /** The step of 1, 2 or 5 times a power of ten nearest above {@code rough}. */
    static double niceStep(double rough) {
        return RoundSteps.atLeast(rough, 1, 2, 5);
    }
}
