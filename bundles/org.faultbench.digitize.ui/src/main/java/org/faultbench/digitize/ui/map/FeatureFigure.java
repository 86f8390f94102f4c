package org.faultbench.digitize.ui.map;

import java.util.List;
import java.util.function.DoubleSupplier;

import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.geometry.Dimension;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.PointList;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.sketch.WellFeature;
import org.faultbench.digitize.ui.editing.TraceTicks;

/**
 * One feature drawn in our map style: contours thin and coloured by depth with their value at the middle vertex,
 * fault traces heavy with ticks on the downthrown side, cut-offs dashed with an FW or HW tag, fault polygons
 * filled pale red, markers as symbols (crest triangle, spill diamond, leak cross in a circle) and wells as filled
 * circles with the name. Tick lengths and symbol sizes are divided by the zoom so they stay the same on screen
 * (line widths are not zoomed by draw2d 3.2 in the first place). Hit-testing follows the lines, not the bounding box, so a long contour does not hide what is under it.
 */
final class FeatureFigure extends Figure {
    static final int MARGIN = 40;
    private static final double HIT_PIXELS = 5;

    private final DoubleSupplier zoom;
    private SheetFeature feature;
    private double[] u = new double[0];
    private double[] v = new double[0];
    private Color colour = MapColours.FAULT;
    private boolean selected;

    FeatureFigure(DoubleSupplier zoom) {
        this.zoom = zoom;
        setOpaque(false);
    }

    /** Shows {@code shown} at drawing positions (u, v) in the given colour. */
    void show(SheetFeature shown, double[] drawingU, double[] drawingV, Color lineColour) {
        feature = shown;
        u = drawingU.clone();
        v = drawingV.clone();
        colour = lineColour;
        double minU = Double.MAX_VALUE;
        double minV = Double.MAX_VALUE;
        double maxU = -Double.MAX_VALUE;
        double maxV = -Double.MAX_VALUE;
        for (int i = 0; i < u.length; i++) {
            minU = Math.min(minU, u[i]);
            maxU = Math.max(maxU, u[i]);
            minV = Math.min(minV, v[i]);
            maxV = Math.max(maxV, v[i]);
        }
        int margin = (int) Math.ceil(MARGIN / Math.min(1, zoom.getAsDouble()));
        setBounds(new Rectangle((int) Math.floor(minU) - margin, (int) Math.floor(minV) - margin,
                (int) Math.ceil(maxU - minU) + 2 * margin, (int) Math.ceil(maxV - minV) + 2 * margin));
        repaint();
    }

    void setSelected(boolean on) {
        selected = on;
        repaint();
    }

    /** Drawing position of vertex {@code index}. */
    Point vertex(int index) {
        return new Point((int) Math.round(u[index]), (int) Math.round(v[index]));
    }

    int vertexCount() {
        return u.length;
    }

    @Override
    public boolean containsPoint(int x, int y) {
        if (!super.containsPoint(x, y) || u.length == 0) {
            return false;
        }
        double tolerance = HIT_PIXELS / zoom.getAsDouble();
        if (u.length == 1) {
            return Math.hypot(x - u[0], y - v[0]) <= 2 * tolerance;
        }
        for (int i = 0; i + 1 < u.length; i++) {
            if (segmentDistance(x, y, i) <= tolerance) {
                return true;
            }
        }
        return false;
    }

    private double segmentDistance(double x, double y, int i) {
        double du = u[i + 1] - u[i];
        double dv = v[i + 1] - v[i];
        double length2 = du * du + dv * dv;
        double t = length2 == 0 ? 0 : Math.max(0, Math.min(1, ((x - u[i]) * du + (y - v[i]) * dv) / length2));
        return Math.hypot(x - (u[i] + t * du), y - (v[i] + t * dv));
    }

    @Override
    protected void paintFigure(Graphics g) {
        if (feature == null) {
            return;
        }
        g.setAntialias(SWT.ON);
        g.setLineStyle(SWT.LINE_SOLID);
        double z = zoom.getAsDouble();
        if (feature instanceof ContourFeature contour) {
            line(g, colour, 1.5, z);
            label(g, ContourLabels.text(contour.depth()), colour, z);
        } else if (feature instanceof FaultTraceFeature trace) {
            line(g, colour, 3.5, z);
            g.setLineWidth(width(2));
            for (double[] t : TraceTicks.ticks(u, v, trace.hangingWallSide(), 9 / z, 40 / z)) {
                g.drawLine((int) Math.round(t[0]), (int) Math.round(t[1]), (int) Math.round(t[2]),
                        (int) Math.round(t[3]));
            }
        } else if (feature instanceof FaultPolygonFeature) {
            g.setAlpha(70);
            g.setBackgroundColor(MapColours.POLYGON_FILL);
            g.fillPolygon(points());
            g.setAlpha(255);
            line(g, colour, 1.5, z);
        } else if (feature instanceof CutOffFeature cutOff) {
            g.setLineStyle(SWT.LINE_DASH);
            line(g, colour, 2, z);
            g.setLineStyle(SWT.LINE_SOLID);
            tag(g, cutOff.wall() == Wall.FOOTWALL ? "FW" : "HW", colour, z);
        } else if (feature instanceof MarkerFeature marker) {
            MarkerSymbols.paint(g, marker.kind(), u[0], v[0], z, colour);
        } else if (feature instanceof WellFeature well) {
            int r = (int) Math.round(5 / z);
            g.setBackgroundColor(MapColours.WELL);
            g.fillOval((int) Math.round(u[0]) - r, (int) Math.round(v[0]) - r, 2 * r, 2 * r);
            haloText(g, well.name(), (int) Math.round(u[0] + 8 / z), (int) Math.round(v[0] - 8 / z),
                    MapColours.WELL);
        }
        if (selected) {
            g.setForegroundColor(MapColours.SELECTED);
            g.setLineStyle(SWT.LINE_DOT);
            g.setLineWidth(width(1));
            if (u.length > 1) {
                g.drawPolyline(points());
            }
        }
    }

    private void line(Graphics g, Color c, double screenWidth, double z) {
        g.setForegroundColor(c);
        g.setLineWidth(width(screenWidth));
        g.drawPolyline(points());
    }

    private void label(Graphics g, String text, Color c, double z) {
        int middle = u.length / 2;
        double lu = u.length % 2 == 0 ? (u[middle - 1] + u[middle]) / 2 : u[middle];
        double lv = u.length % 2 == 0 ? (v[middle - 1] + v[middle]) / 2 : v[middle];
        Dimension size = textSize(g, text);
        haloText(g, text, (int) Math.round(lu) - size.width / 2, (int) Math.round(lv) - size.height / 2, c);
    }

    private void tag(Graphics g, String text, Color c, double z) {
        haloText(g, text, (int) Math.round(u[0] + 6 / z), (int) Math.round(v[0] + 4 / z), c);
    }

    private static void haloText(Graphics g, String text, int x, int y, Color c) {
        Dimension size = textSize(g, text);
        g.setBackgroundColor(MapColours.LABEL_HALO);
        g.setAlpha(200);
        g.fillRectangle(x - 1, y, size.width + 2, size.height);
        g.setAlpha(255);
        g.setForegroundColor(c);
        g.drawText(text, x, y);
    }

    private static Dimension textSize(Graphics g, String text) {
        int width = g.getFontMetrics().getAverageCharWidth() * text.length();
        return new Dimension(width, g.getFontMetrics().getHeight());
    }

    private PointList points() {
        PointList points = new PointList(u.length);
        for (int i = 0; i < u.length; i++) {
            points.addPoint((int) Math.round(u[i]), (int) Math.round(v[i]));
        }
        return points;
    }

    /** A line width in screen pixels: draw2d 3.2's scaled graphics zooms positions and fonts, not line widths. */
    static int width(double screenPixels) {
        return Math.max(1, (int) Math.round(screenPixels));
    }

}
