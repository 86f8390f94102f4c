package org.faultbench.report.chart;

import java.awt.FontMetrics;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;

import org.faultbench.sim.LeakProbabilityMap;

/**
 * Leak probability on the unrolled fault plane: every (u, z) cell coloured by the share of realisations in which
 * it leaks, with a colour bar from 0 to 1. Cells that never leak stay pale, so the leaking windows stand out.
 */
public final class LeakProbabilityChart {
    public static final int WIDTH = 900;
    public static final int HEIGHT = 460;
    /** Colour bar position: x of its left edge, and its top and bottom rows (1 at the top, 0 at the bottom). */
    public static final int BAR_X = WIDTH - 78;
    public static final int BAR_TOP = 44;
    public static final int BAR_BOTTOM = HEIGHT - 62;
    private static final int[] MARGINS = { 70, 34, 120, 52 };

    private LeakProbabilityChart() {
    }

    public static BufferedImage render(LeakProbabilityMap map, String title) {
        double half = map.columns() > 1 ? (map.u()[1] - map.u()[0]) / 2 : 1;
        double uMin = map.u()[0] - half;
        double uMax = map.u()[map.columns() - 1] + half;
        double zBase = map.zTop() + map.rows() * map.cellHeight();
        PlotFrame frame = new PlotFrame(WIDTH, HEIGHT, MARGINS, uMin, uMax, map.zTop(), zBase, true);
        var g = frame.graphics();
        for (int row = 0; row < map.rows(); row++) {
            double y0 = frame.py(map.zTop() + row * map.cellHeight());
            double y1 = frame.py(map.zTop() + (row + 1) * map.cellHeight());
            for (int c = 0; c < map.columns(); c++) {
                double p = map.probability(c, row);
                g.setColor(p > 0 ? Palette.probability(p) : Palette.NO_DATA);
                double x0 = frame.px(map.u()[c] - half);
                double x1 = frame.px(map.u()[c] + half);
                g.fill(new Rectangle2D.Double(x0, y0, x1 - x0 + 0.6, y1 - y0 + 0.6));
            }
        }
        frame.axes(title, "distance along strike u [m]", "depth [m TVDSS]", false);
        colourBar(frame);
        return frame.finish();
    }

    private static void colourBar(PlotFrame frame) {
        var g = frame.graphics();
        for (int y = BAR_TOP; y <= BAR_BOTTOM; y++) {
            g.setColor(Palette.probability((BAR_BOTTOM - y) / (double) (BAR_BOTTOM - BAR_TOP)));
            g.fillRect(BAR_X, y, 18, 1);
        }
        g.setColor(Palette.INK);
        g.drawRect(BAR_X, BAR_TOP, 18, BAR_BOTTOM - BAR_TOP);
        g.setFont(PlotFrame.SMALL);
        FontMetrics fm = g.getFontMetrics();
        for (int i = 0; i <= 4; i++) {
            double p = i / 4.0;
            int y = (int) Math.round(BAR_BOTTOM - p * (BAR_BOTTOM - BAR_TOP));
            g.drawLine(BAR_X + 18, y, BAR_X + 22, y);
            g.drawString(String.format(java.util.Locale.ROOT, "%.2f", p), BAR_X + 25, y + fm.getAscent() / 2 - 1);
        }
        g.drawString("leak", BAR_X - 4, BAR_TOP - 22);
        g.drawString("probability", BAR_X - 4, BAR_TOP - 8);
        g.setColor(Palette.NO_DATA);
        g.fillRect(BAR_X, BAR_BOTTOM + 16, 18, 12);
        g.setColor(Palette.INK);
        g.drawRect(BAR_X, BAR_BOTTOM + 16, 18, 12);
        g.drawString("never", BAR_X + 25, BAR_BOTTOM + 27);
    }
}
