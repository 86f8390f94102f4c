package org.faultbench.report.chart;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;

import org.faultbench.faults.profile.ThrowProfile;

/**
 * Throw against distance along strike for one fault: the line a geologist reads for shape, tips and sign. Gaps
 * (stations without data) break the line rather than being bridged.
 */
public final class ThrowProfileChart {
    public static final int WIDTH = 900;
    public static final int HEIGHT = 360;
    private static final int[] MARGINS = { 70, 34, 24, 52 };

    private ThrowProfileChart() {
    }

    public static BufferedImage render(ThrowProfile profile, String title) {
        double low = 0;
        double high = 0;
        for (int k = 0; k < profile.size(); k++) {
            double t = profile.throwAt(k);
            if (Double.isFinite(t)) {
                low = Math.min(low, t);
                high = Math.max(high, t);
            }
        }
        double pad = Math.max(5, 0.1 * (high - low));
        PlotFrame frame = new PlotFrame(WIDTH, HEIGHT, MARGINS, profile.u(0), profile.u(profile.size() - 1),
                low - (low < 0 ? pad : 0), high + pad, false);
        frame.axes(title, "distance along strike u [m]", "throw [m]", true);
        frame.clip();
        frame.line(Palette.INK, 1f, frame.left(), frame.py(0), frame.right(), frame.py(0));
        Path2D.Double path = new Path2D.Double();
        boolean drawing = false;
        for (int k = 0; k < profile.size(); k++) {
            double t = profile.throwAt(k);
            if (!Double.isFinite(t)) {
                drawing = false;
                continue;
            }
            if (drawing) {
                path.lineTo(frame.px(profile.u(k)), frame.py(t));
            } else {
                path.moveTo(frame.px(profile.u(k)), frame.py(t));
                drawing = true;
            }
        }
        var g = frame.graphics();
        g.setColor(Palette.BLUE);
        g.setStroke(new BasicStroke(2.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(path);
        int every = Math.max(1, profile.size() / 60);
        for (int k = 0; k < profile.size(); k += every) {
            double t = profile.throwAt(k);
            if (Double.isFinite(t)) {
                g.fill(new Ellipse2D.Double(frame.px(profile.u(k)) - 2.5, frame.py(t) - 2.5, 5, 5));
            }
        }
        frame.unclip();
        return frame.finish();
    }
}
