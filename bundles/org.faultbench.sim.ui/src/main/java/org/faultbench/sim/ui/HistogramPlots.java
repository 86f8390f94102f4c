package org.faultbench.sim.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.graphics.RGB;
import org.faultbench.sim.AdaptiveHistogram;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.StreamingSummary;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.ui.DisplayUnits;
import org.faultbench.ui.NumberText;
import org.faultbench.ui.plot.PlotAxis;
import org.faultbench.ui.plot.PlotSeries;

/**
 * Turns a quantity's histogram into what the results view plots: bars of realisation counts, and the exceedance
 * curve (probability of exceeding a value, from 1 down to 0, read from the cumulative counts), each with vertical
 * P90/P50/P10 markers labelled in the exceedance convention. Empty bins at either end are left out.
 */
final class HistogramPlots {
    static final RGB BARS = new RGB(90, 120, 150);
    static final RGB CURVE = new RGB(30, 90, 180);
    /** Marker colours as on the Allan diagram's contact lines: light to dark from low to high case. */
    private static final RGB[] MARKERS = { new RGB(46, 139, 139), new RGB(20, 20, 20), new RGB(214, 150, 40) };

    /** Axes and series of one plot. */
    record Plot(PlotAxis x, PlotAxis y, List<PlotSeries> series) {
    }

    private HistogramPlots() {
    }

    /** Bars of counts per bin; the bars' heights sum to the finite realisations. */
    static Plot histogram(UnitQuantity q, AdaptiveHistogram h, StreamingSummary s, DisplayUnits units) {
        int[] occupied = occupied(h);
        int n = occupied[1] - occupied[0] + 1;
        double[] centres = new double[n];
        double[] counts = new double[n];
        double maxCount = 0;
        for (int i = 0; i < n; i++) {
            int bin = occupied[0] + i;
            centres[i] = ResultRow.display(q, h.binLower(bin) + h.binWidth() / 2, units);
            counts[i] = h.count(bin);
            maxCount = Math.max(maxCount, counts[i]);
        }
        double lo = ResultRow.display(q, h.binLower(occupied[0]), units);
        double hi = ResultRow.display(q, h.binLower(occupied[1] + 1), units);
        List<PlotSeries> series = new ArrayList<>();
        series.add(new PlotSeries("realisations per bin (" + h.finiteCount() + " of " + h.count() + ")", centres,
                counts, BARS, PlotSeries.Style.BARS));
        series.addAll(markers(q, s, units));
        return new Plot(PlotAxis.linear(xTitle(q, units), lo, hi), PlotAxis.linear("realisations", 0, maxCount * 1.1),
                series);
    }

    /** The probability of exceeding each bin edge, 1 at the first occupied edge down to 0 at the last. */
    static Plot exceedance(UnitQuantity q, AdaptiveHistogram h, StreamingSummary s, DisplayUnits units) {
        int[] occupied = occupied(h);
        int n = occupied[1] - occupied[0] + 2;
        double[] edges = new double[n];
        double[] probability = new double[n];
        edges[0] = ResultRow.display(q, h.binLower(occupied[0]), units);
        probability[0] = 1;
        for (int i = 1; i < n; i++) {
            int bin = occupied[0] + i - 1;
            edges[i] = ResultRow.display(q, h.binLower(bin + 1), units);
            probability[i] = h.exceedanceAbove(bin);
        }
        List<PlotSeries> series = new ArrayList<>();
        series.add(new PlotSeries("probability of exceeding", edges, probability, CURVE, PlotSeries.Style.LINE));
        series.addAll(markers(q, s, units));
        return new Plot(PlotAxis.linear(xTitle(q, units), edges[0], edges[n - 1]),
                new PlotAxis("probability of exceeding", 0, 1, false), series);
    }

    private static List<PlotSeries> markers(UnitQuantity q, StreamingSummary s, DisplayUnits units) {
        List<PlotSeries> markers = new ArrayList<>();
        ExceedanceLevel[] levels = ExceedanceLevel.values();
        for (int i = 0; i < levels.length; i++) {
            double value = ResultRow.display(q, s.level(levels[i]), units);
            markers.add(new PlotSeries(levels[i].label() + ": " + NumberText.of(value, ResultRow.isVolume(q) ? 2 : 1)
                    + " " + ResultRow.unitSymbol(q, units), new double[] { value }, new double[] { 0 }, MARKERS[i],
                    PlotSeries.Style.VERTICAL_MARKERS));
        }
        return markers;
    }

    private static String xTitle(UnitQuantity q, DisplayUnits units) {
        return ResultRow.label(q, units);
    }

    /** First and last bin holding a value. */
    private static int[] occupied(AdaptiveHistogram h) {
        int first = 0;
        while (first < h.bins() - 1 && h.count(first) == 0) {
            first++;
        }
        int last = h.bins() - 1;
        while (last > first && h.count(last) == 0) {
            last--;
        }
        return new int[] { first, last };
    }
}
