package org.faultbench.report.chart;

import java.awt.FontMetrics;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;

import org.faultbench.sim.TornadoBar;

/**
 * Tornado chart of one unit's contact depth: for each input, the contact with that input at its P90 (low) and P10
 * (high) value, every other input at its median, as bars either side of the base-case contact, largest swing on top.
 */
public final class TornadoChart {
    public static final int WIDTH = 900;
    static final int BAR_HEIGHT = 26;
    private static final int MAX_BARS = 12;
    private static final int LEFT = 250;

    private TornadoChart() {
    }

    public static BufferedImage render(String title, double baseContact, List<TornadoBar> bars) {
        List<TornadoBar> shown = bars.stream().filter(b -> Double.isFinite(b.contactWithLowInput())
                && Double.isFinite(b.contactWithHighInput())).limit(MAX_BARS).toList();
        double min = baseContact;
        double max = baseContact;
        for (TornadoBar b : shown) {
            min = Math.min(min, Math.min(b.contactWithLowInput(), b.contactWithHighInput()));
            max = Math.max(max, Math.max(b.contactWithLowInput(), b.contactWithHighInput()));
        }
        double pad = Math.max(1, 0.08 * (max - min));
        int height = 34 + 62 + Math.max(1, shown.size()) * BAR_HEIGHT + 36;
        PlotFrame frame = new PlotFrame(WIDTH, height, new int[] { LEFT, 34, 30, 98 }, min - pad, max + pad, 0,
                Math.max(1, shown.size()), true);
        frame.hideYTicks();
        frame.axes(title, "contact depth [m TVDSS]", null, false);
        var g = frame.graphics();
        g.setFont(PlotFrame.SMALL);
        FontMetrics fm = g.getFontMetrics();
        double base = frame.px(baseContact);
        for (int i = 0; i < shown.size(); i++) {
            TornadoBar b = shown.get(i);
            double y = frame.py(i) + 4;
            double h = BAR_HEIGHT - 8;
            bar(frame, Palette.BLUE, base, frame.px(b.contactWithLowInput()), y, h);
            bar(frame, Palette.ORANGE, base, frame.px(b.contactWithHighInput()), y, h);
            g.setColor(Palette.INK);
            String name = fit(b.input(), fm, LEFT - 16);
            g.drawString(name, LEFT - 10 - fm.stringWidth(name), (float) (y + h / 2 + fm.getAscent() / 2.0 - 1));
        }
        frame.line(Palette.INK, 1.5f, base, frame.top(), base, frame.bottom());
        legend(frame, height, baseContact);
        return frame.finish();
    }

    private static void bar(PlotFrame frame, java.awt.Color colour, double from, double to, double y, double h) {
        var g = frame.graphics();
        g.setColor(colour);
        g.fill(new Rectangle2D.Double(Math.min(from, to), y, Math.max(1, Math.abs(to - from)), h));
    }

    private static void legend(PlotFrame frame, int height, double baseContact) {
        var g = frame.graphics();
        g.setFont(PlotFrame.SMALL);
        int y = height - 22;
        int x = frame.left();
        g.setColor(Palette.BLUE);
        g.fillRect(x, y - 10, 16, 12);
        g.setColor(Palette.INK);
        g.drawString("input at its P90 (low case)", x + 22, y);
        x += 190;
        g.setColor(Palette.ORANGE);
        g.fillRect(x, y - 10, 16, 12);
        g.setColor(Palette.INK);
        g.drawString("input at its P10 (high case)", x + 22, y);
        x += 200;
        g.drawString(String.format(java.util.Locale.ROOT, "| base case %.1f m", baseContact), x, y);
    }

    private static String fit(String text, FontMetrics fm, int width) {
        if (fm.stringWidth(text) <= width) {
            return text;
        }
        String t = text;
        while (t.length() > 3 && fm.stringWidth(t + "...") > width) {
            t = t.substring(0, t.length() - 1);
        }
        return t + "...";
    }
}
