package org.faultbench.ui.plot;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.draw2d.ColorConstants;
import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Dimension;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.faultbench.ui.NumberText;

/**
 * An x-y plot as a draw2d figure: axes with ticks and titles, series as lines, symbols, vertical markers or bars,
 * and a legend. Points that are not finite, or not positive on a log axis, are skipped rather than drawn at the edge.
 */
public class XYPlotFigure extends Figure {
    private static final int LEFT = 64;
    private static final int BOTTOM = 42;
    private static final int TOP = 14;
    private static final int RIGHT = 14;
    private PlotAxis xAxis = new PlotAxis("", 0, 1, false);
    private PlotAxis yAxis = new PlotAxis("", 0, 1, false);
    private boolean yDownward;
    private final List<PlotSeries> series = new ArrayList<>();
    private String message = "";

    /** Shows {@code newSeries} on the given axes; {@code downward} draws y increasing down the page (depths). */
    public void show(PlotAxis x, PlotAxis y, boolean downward, List<PlotSeries> newSeries) {
        xAxis = x;
        yAxis = y;
        yDownward = downward;
        series.clear();
        series.addAll(newSeries);
        message = "";
        repaint();
    }

    /** Clears the plot and shows a line of text instead (e.g. why there is nothing to plot). */
    public void showMessage(String text) {
        series.clear();
        message = text;
        repaint();
    }

    public List<PlotSeries> series() {
        return List.copyOf(series);
    }

    /** The plotting rectangle inside the axes, in figure coordinates. */
    public Rectangle plotArea() {
        Rectangle b = getBounds();
        return new Rectangle(b.x + LEFT, b.y + TOP, Math.max(1, b.width - LEFT - RIGHT),
                Math.max(1, b.height - TOP - BOTTOM));
    }

    /** Pixel column of data value {@code x}. */
    public int toPixelX(double x) {
        Rectangle p = plotArea();
        return p.x + (int) Math.round(xAxis.fraction(x) * p.width);
    }

    /** Pixel row of data value {@code y}. */
    public int toPixelY(double y) {
        Rectangle p = plotArea();
        double f = yAxis.fraction(y);
        return yDownward ? p.y + (int) Math.round(f * p.height) : p.bottom() - (int) Math.round(f * p.height);
    }

    /** Data value of pixel column {@code px} (inverse of {@link #toPixelX}). */
    public double toDataX(int px) {
        Rectangle p = plotArea();
        double f = (px - p.x) / (double) p.width;
        return xAxis.logarithmic() ? Math.pow(10, Math.log10(xAxis.min()) + f * Math.log10(xAxis.max() / xAxis.min()))
                : xAxis.min() + f * (xAxis.max() - xAxis.min());
    }

    @Override
    protected void paintFigure(Graphics g) {
        g.setBackgroundColor(ColorConstants.white);
        g.fillRectangle(getBounds());
        g.setAntialias(SWT.ON);
        if (!message.isEmpty()) {
            g.setForegroundColor(ColorConstants.darkGray);
            g.drawText(message, getBounds().x + 12, getBounds().y + 12);
            return;
        }
        paintAxes(g);
        Rectangle area = plotArea();
        g.pushState();
        g.clipRect(area);
        for (PlotSeries s : series) {
            paintSeries(g, s, area);
        }
        g.popState();
        paintLegend(g, area);
    }

    private void paintAxes(Graphics g) {
        Rectangle p = plotArea();
        g.setForegroundColor(ColorConstants.lightGray);
        for (double t : xAxis.ticks()) {
            g.drawLine(toPixelX(t), p.y, toPixelX(t), p.bottom());
        }
        for (double t : yAxis.ticks()) {
            g.drawLine(p.x, toPixelY(t), p.right(), toPixelY(t));
        }
        g.setForegroundColor(ColorConstants.black);
        g.drawRectangle(p.x, p.y, p.width, p.height);
        for (double t : xAxis.ticks()) {
            String label = label(t, xAxis);
            Dimension d = textSize(label);
            g.drawText(label, toPixelX(t) - d.width / 2, p.bottom() + 4);
        }
        for (double t : yAxis.ticks()) {
            String label = label(t, yAxis);
            Dimension d = textSize(label);
            g.drawText(label, p.x - d.width - 5, toPixelY(t) - d.height / 2);
        }
        Dimension xt = textSize(xAxis.title());
        g.drawText(xAxis.title(), p.x + (p.width - xt.width) / 2, p.bottom() + 22);
        g.drawText(yAxis.title(), getBounds().x + 4, getBounds().y + 0);
    }

    private static String label(double value, PlotAxis axis) {
        if (axis.logarithmic()) {
            return value >= 1 ? NumberText.of(value, 0) : String.valueOf(value);
        }
        double step = PlotAxis.niceStep((axis.max() - axis.min()) / 6);
        return NumberText.of(value, step >= 1 ? 0 : (int) Math.ceil(-Math.log10(step)));
    }

    private Dimension textSize(String text) {
        return org.eclipse.draw2d.FigureUtilities.getTextExtents(text, getFont());
    }

    private void paintSeries(Graphics g, PlotSeries s, Rectangle area) {
        if (s.style() == PlotSeries.Style.BARS) {
            paintBars(g, s);
            return;
        }
        Color colour = new Color(s.colour());
        g.setForegroundColor(colour);
        g.setBackgroundColor(colour);
        g.setLineWidth(s.style() == PlotSeries.Style.POINTS ? 1 : 2);
        g.setLineStyle(s.style() == PlotSeries.Style.DASHED_LINE ? SWT.LINE_DASH : SWT.LINE_SOLID);
        int lastX = 0;
        int lastY = 0;
        boolean open = false;
        for (int i = 0; i < s.x().length; i++) {
            double x = s.x()[i];
            double y = s.y()[i];
            if (s.style() == PlotSeries.Style.VERTICAL_MARKERS) {
                if (plottable(x, xAxis)) {
                    g.drawLine(toPixelX(x), area.y, toPixelX(x), area.bottom());
                }
                continue;
            }
            if (!plottable(x, xAxis) || !plottable(y, yAxis)) {
                open = false;
                continue;
            }
            int px = toPixelX(x);
            int py = toPixelY(y);
            if (s.style() == PlotSeries.Style.POINTS) {
                g.fillOval(px - 4, py - 4, 9, 9);
            } else if (open) {
                g.drawLine(lastX, lastY, px, py);
            }
            lastX = px;
            lastY = py;
            open = true;
        }
        g.setLineStyle(SWT.LINE_SOLID);
        g.setLineWidth(1);
    }

    /** Bars from the baseline (0, or the bottom of a log axis) up to each y, filled pale and outlined. */
    private void paintBars(Graphics g, PlotSeries s) {
        double[] x = s.x();
        double[] y = s.y();
        double baseline = yAxis.logarithmic() ? yAxis.min() : Math.max(yAxis.min(), Math.min(0, yAxis.max()));
        Color outline = new Color(s.colour());
        Color fill = new Color(paler(s.colour()));
        g.setLineWidth(1);
        g.setLineStyle(SWT.LINE_SOLID);
        for (int i = 0; i < x.length; i++) {
            if (!plottable(x[i], xAxis) || !plottable(y[i], yAxis)) {
                continue;
            }
            double left = i > 0 ? (x[i - 1] + x[i]) / 2 : x[i] - (x.length > 1 ? (x[1] - x[0]) / 2 : 0.5);
            double right = i + 1 < x.length ? (x[i] + x[i + 1]) / 2
                    : x[i] + (x.length > 1 ? (x[i] - x[i - 1]) / 2 : 0.5);
            int px0 = toPixelX(left);
            int px1 = toPixelX(right);
            int top = toPixelY(y[i]);
            int bottom = toPixelY(baseline);
            Rectangle bar = new Rectangle(Math.min(px0, px1), Math.min(top, bottom), Math.max(1, Math.abs(px1 - px0)),
                    Math.abs(bottom - top));
            g.setBackgroundColor(fill);
            g.fillRectangle(bar);
            g.setForegroundColor(outline);
            g.drawRectangle(bar);
        }
    }

    /** Halfway to white: a fill that keeps outlines and markers readable over it. */
    static org.eclipse.swt.graphics.RGB paler(org.eclipse.swt.graphics.RGB c) {
        return new org.eclipse.swt.graphics.RGB((c.red + 255) / 2, (c.green + 255) / 2, (c.blue + 255) / 2);
    }

    private static boolean plottable(double v, PlotAxis axis) {
        return Double.isFinite(v) && (!axis.logarithmic() || v > 0);
    }

    private void paintLegend(Graphics g, Rectangle area) {
        int y = area.y + 6;
        for (PlotSeries s : series) {
            if (s.name().isEmpty()) {
                continue;
            }
            Dimension d = textSize(s.name());
            int x = area.right() - d.width - 34;
            g.setBackgroundColor(ColorConstants.white);
            g.fillRectangle(x - 4, y - 1, d.width + 36, d.height + 2);
            Color colour = new Color(s.colour());
            g.setForegroundColor(colour);
            g.setBackgroundColor(colour);
            if (s.style() == PlotSeries.Style.POINTS) {
                g.fillOval(x + 6, y + d.height / 2 - 4, 9, 9);
            } else if (s.style() == PlotSeries.Style.BARS) {
                g.setBackgroundColor(new Color(paler(s.colour())));
                g.fillRectangle(x + 4, y + 2, 14, d.height - 4);
                g.drawRectangle(x + 4, y + 2, 14, d.height - 4);
            } else {
                g.setLineWidth(2);
                g.setLineStyle(s.style() == PlotSeries.Style.DASHED_LINE ? SWT.LINE_DASH : SWT.LINE_SOLID);
                g.drawLine(x, y + d.height / 2, x + 22, y + d.height / 2);
                g.setLineStyle(SWT.LINE_SOLID);
                g.setLineWidth(1);
            }
            g.setForegroundColor(ColorConstants.black);
            g.drawText(s.name(), x + 28, y);
            y += d.height + 3;
        }
    }
}
