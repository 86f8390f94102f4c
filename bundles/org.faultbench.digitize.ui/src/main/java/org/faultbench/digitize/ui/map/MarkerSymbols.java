package org.faultbench.digitize.ui.map;

import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.PointList;
import org.eclipse.swt.graphics.Color;
import org.faultbench.digitize.sketch.MarkerKind;

/** Our trap-marker symbols: crest = filled triangle, spill point = filled diamond, leak point = circle with a cross. */
final class MarkerSymbols {

    private MarkerSymbols() {
    }

    static void paint(Graphics g, MarkerKind kind, double u, double v, double zoom, Color colour) {
        int r = (int) Math.round(7 / zoom);
        int x = (int) Math.round(u);
        int y = (int) Math.round(v);
        g.setBackgroundColor(colour);
        g.setForegroundColor(colour);
        g.setLineWidth(FeatureFigure.width(2));
        switch (kind) {
            case CREST -> g.fillPolygon(new PointList(new int[] { x, y - r, x + r, y + r, x - r, y + r }));
            case SPILL -> g.fillPolygon(new PointList(new int[] { x, y - r, x + r, y, x, y + r, x - r, y }));
            case LEAK -> {
                g.drawOval(x - r, y - r, 2 * r, 2 * r);
                g.drawLine(x - r, y - r, x + r, y + r);
                g.drawLine(x - r, y + r, x + r, y - r);
            }
        }
    }
}
