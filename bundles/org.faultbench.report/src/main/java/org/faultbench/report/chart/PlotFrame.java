package org.faultbench.report.chart;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.image.BufferedImage;
import java.util.Locale;

/**
 * A chart image with a plot area and linear axes: maps data (x, y) to pixels and draws ticks, labels and the title.
 * With {@code yDown} the y axis grows downward, as depth does.
 */
public final class PlotFrame {
    static final Font TEXT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);

    private final BufferedImage image;
    private final Graphics2D g;
    private final int left;
    private final int top;
    private final int right;
    private final int bottom;
    private final double xMin;
    private final double xMax;
    private final double yMin;
    private final double yMax;
    private final boolean yDown;
    private boolean yTicks = true;

    /**
     * @param margins left, top, right, bottom margins in pixels around the plot area
     */
    public PlotFrame(int width, int height, int[] margins, double xMin, double xMax, double yMin, double yMax,
            boolean yDown) {
        if (!(xMax > xMin) || !(yMax > yMin)) {
            throw new IllegalArgumentException("chart range is empty: x [" + xMin + ", " + xMax + "], y [" + yMin
                    + ", " + yMax + "]");
        }
        this.image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        this.g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, width, height);
        this.left = margins[0];
        this.top = margins[1];
        this.right = width - margins[2];
        this.bottom = height - margins[3];
        this.xMin = xMin;
        this.xMax = xMax;
        this.yMin = yMin;
        this.yMax = yMax;
        this.yDown = yDown;
    }

    public Graphics2D graphics() {
        return g;
    }

    public BufferedImage image() {
        return image;
    }

    public double px(double x) {
        return left + (x - xMin) / (xMax - xMin) * (right - left);
    }

    public double py(double y) {
        double t = (y - yMin) / (yMax - yMin);
        return yDown ? top + t * (bottom - top) : bottom - t * (bottom - top);
    }

    /** Data x per pixel. */
    public double xPerPixel() {
        return (xMax - xMin) / (right - left);
    }

    public int left() {
        return left;
    }

    public int top() {
        return top;
    }

    public int right() {
        return right;
    }

    public int bottom() {
        return bottom;
    }

    /** Restricts drawing to the plot area (until {@link #unclip()}). */
    public void clip() {
        g.setClip(left, top, right - left, bottom - top);
    }

    public void unclip() {
        g.setClip(null);
    }

    /** Leaves out the y-axis ticks, for charts whose rows are categories. */
    public void hideYTicks() {
        yTicks = false;
    }

    /** Frame, ticks with labels on all used axes, light grid lines, axis titles and the chart title. */
    public void axes(String title, String xLabel, String yLabel, boolean grid) {
        g.setFont(SMALL);
        FontMetrics fm = g.getFontMetrics();
        for (double x : Ticks.values(xMin, xMax, Math.max(2, (right - left) / 90))) {
            double p = px(x);
            if (grid) {
                line(Palette.GRID_LINE, 1, p, top, p, bottom);
            }
            line(Palette.INK, 1, p, bottom, p, bottom + 5);
            String text = number(x);
            g.drawString(text, (float) (p - fm.stringWidth(text) / 2.0), bottom + 7 + fm.getAscent());
        }
        for (double y : yTicks ? Ticks.values(yMin, yMax, Math.max(2, (bottom - top) / 60)) : java.util.List.<Double>of()) {
            double p = py(y);
            if (grid) {
                line(Palette.GRID_LINE, 1, left, p, right, p);
            }
            line(Palette.INK, 1, left - 5, p, left, p);
            String text = number(y);
            g.drawString(text, left - 8 - fm.stringWidth(text), (float) (p + fm.getAscent() / 2.0 - 1));
        }
        g.setColor(Palette.INK);
        g.setStroke(new BasicStroke(1.2f));
        g.drawRect(left, top, right - left, bottom - top);
        g.setFont(TEXT);
        fm = g.getFontMetrics();
        if (xLabel != null) {
            g.drawString(xLabel, (left + right - fm.stringWidth(xLabel)) / 2f, bottom + 24 + fm.getAscent());
        }
        if (yLabel != null) {
            Graphics2D rotated = (Graphics2D) g.create();
            rotated.rotate(-Math.PI / 2);
            rotated.drawString(yLabel, -(top + bottom + fm.stringWidth(yLabel)) / 2f, 18f);
            rotated.dispose();
        }
        title(title);
    }

    /** The chart title, centred above the plot area. */
    public void title(String title) {
        if (title != null) {
            g.setColor(Palette.INK);
            g.setFont(TITLE);
            FontMetrics fm = g.getFontMetrics();
            g.drawString(title, (image.getWidth() - fm.stringWidth(title)) / 2f, 6 + fm.getAscent());
        }
    }

    public void line(java.awt.Color colour, float width, double x1, double y1, double x2, double y2) {
        g.setColor(colour);
        g.setStroke(new BasicStroke(width));
        g.draw(new Line2D.Double(x1, y1, x2, y2));
    }

    /** Tick label: no decimals for whole numbers, otherwise up to two. */
    static String number(double v) {
        if (Math.abs(v - Math.rint(v)) < 1e-9) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.replaceAll("0+$", "");
    }

    /** Releases the graphics and returns the finished image. */
    public BufferedImage finish() {
        g.dispose();
        return image;
    }
}
