package org.faultbench.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Polygon;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.faultbench.core.grid.RegularGrid;
import org.faultbench.faults.Fault;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * Depth map of the reference horizon around the compartment: depth shading, contours (every fifth labelled), fault
 * traces with ticks on the downthrown side, the compartment outline, wells, coordinate ticks, a scale bar and a north
 * arrow. One map unit is one metre on both axes, so the map is never stretched.
 */
public final class MapChart {
    public static final int PLOT_WIDTH = 760;
    private static final int LEFT = 96;
    private static final int TOP = 34;
    private static final int RIGHT = 44;
    private static final int BOTTOM = 70;

    private final RegularGrid grid;
    private final List<Fault> faults;
    private final org.locationtech.jts.geom.Polygon compartment;
    private final List<MapWell> wells;
    private final Envelope view;

    public MapChart(RegularGrid grid, List<Fault> faults, org.locationtech.jts.geom.Polygon compartment,
            List<MapWell> wells) {
        this.grid = grid;
        this.faults = List.copyOf(faults);
        this.compartment = compartment;
        this.wells = List.copyOf(wells);
        this.view = view();
    }

    /** The area shown: compartment, faults and wells with room around them, inside the grid. */
    public Envelope view() {
        Envelope e = new Envelope(compartment.getEnvelopeInternal());
        faults.forEach(f -> e.expandToInclude(f.trace().getEnvelopeInternal()));
        wells.forEach(w -> e.expandToInclude(w.x(), w.y()));
        double pad = 0.35 * Math.max(e.getWidth(), e.getHeight());
        e.expandBy(pad);
        Envelope gridBox = new Envelope(grid.x(0), grid.x(grid.nx() - 1), grid.y(0), grid.y(grid.ny() - 1));
        Envelope clipped = e.intersection(gridBox);
        return clipped.isNull() ? gridBox : clipped;
    }

    public BufferedImage render(String title, String horizon) {
        int plotHeight = (int) Math.round(PLOT_WIDTH * view.getHeight() / view.getWidth());
        PlotFrame frame = new PlotFrame(LEFT + PLOT_WIDTH + RIGHT, TOP + plotHeight + BOTTOM,
                new int[] { LEFT, TOP, RIGHT, BOTTOM }, view.getMinX(), view.getMaxX(), view.getMinY(),
                view.getMaxY(), false);
        double[] range = depthRange();
        shade(frame, range);
        frame.clip();
        double interval = Ticks.step(range[0], range[1], 45);
        contours(frame, range, interval);
        outline(frame);
        faultTraces(frame);
        wells(frame);
        frame.unclip();
        frame.axes(title, "x (easting) [m]", "y (northing) [m]", false);
        scaleBar(frame);
        northArrow(frame);
        note(frame, String.format(Locale.ROOT, "%s, m TVDSS; contour interval %s m, labelled every %s m", horizon,
                PlotFrame.number(interval), PlotFrame.number(5 * interval)));
        return frame.finish();
    }

    private double[] depthRange() {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        int[] cells = cellRange();
        for (int j = cells[2]; j <= cells[3]; j++) {
            for (int i = cells[0]; i <= cells[1]; i++) {
                double v = grid.value(i, j);
                if (!Double.isNaN(v)) {
                    min = Math.min(min, v);
                    max = Math.max(max, v);
                }
            }
        }
        return new double[] { min, max };
    }

    /** Node index ranges {iMin, iMax, jMin, jMax} covering the view. */
    private int[] cellRange() {
        var geo = grid.geometry();
        int i0 = clamp((int) Math.floor((view.getMinX() - geo.x0()) / geo.dx()), grid.nx() - 1);
        int i1 = clamp((int) Math.ceil((view.getMaxX() - geo.x0()) / geo.dx()), grid.nx() - 1);
        int j0 = clamp((int) Math.floor((view.getMinY() - geo.y0()) / geo.dy()), grid.ny() - 1);
        int j1 = clamp((int) Math.ceil((view.getMaxY() - geo.y0()) / geo.dy()), grid.ny() - 1);
        return new int[] { i0, i1, j0, j1 };
    }

    private static int clamp(int v, int max) {
        return Math.max(0, Math.min(max, v));
    }

    private void shade(PlotFrame frame, double[] range) {
        BufferedImage image = frame.image();
        for (int py = frame.top(); py < frame.bottom(); py++) {
            double y = view.getMaxY() - (py + 0.5 - frame.top()) * frame.xPerPixel();
            for (int px = frame.left(); px < frame.right(); px++) {
                double x = view.getMinX() + (px + 0.5 - frame.left()) * frame.xPerPixel();
                double z = grid.interpolate(x, y);
                image.setRGB(px, py, Double.isNaN(z) ? Palette.NO_DATA.getRGB()
                        : Palette.depth(z, range[0], range[1]).getRGB());
            }
        }
    }

    private void contours(PlotFrame frame, double[] range, double interval) {
        GeometryFactory factory = new GeometryFactory();
        List<Geometry> traces = new ArrayList<>();
        faults.forEach(f -> traces.add(f.trace()));
        var geo = grid.geometry();
        PreparedGeometry faultZone = PreparedGeometryFactory.prepare(factory.buildGeometry(traces)
                .buffer(0.75 * Math.hypot(geo.dx(), geo.dy())));
        int[] nodes = cellRange();
        int[] cells = { nodes[0], Math.min(nodes[1], grid.nx() - 2) + 1, nodes[2], Math.min(nodes[3], grid.ny() - 2) + 1 };
        cells[1] = Math.min(cells[1], grid.nx() - 1);
        cells[3] = Math.min(cells[3], grid.ny() - 1);
        boolean[] skip = new boolean[grid.nx() * grid.ny()];
        for (int j = cells[2]; j < cells[3]; j++) {
            for (int i = cells[0]; i < cells[1]; i++) {
                double cx = grid.x(i) + geo.dx() / 2;
                double cy = grid.y(j) + geo.dy() / 2;
                skip[j * grid.nx() + i] = faultZone.contains(factory.createPoint(new Coordinate(cx, cy)));
            }
        }
        Graphics2D g = frame.graphics();
        List<double[]> labelBoxes = new ArrayList<>();
        int first = (int) Math.ceil(range[0] / interval);
        for (int n = first; n * interval <= range[1]; n++) {
            double level = n * interval;
            boolean major = n % 5 == 0;
            List<double[]> segments = ContourSegments.at(grid, level, cells, k -> skip[k]);
            g.setColor(new Color(0x30, 0x30, 0x30, major ? 220 : 120));
            g.setStroke(new BasicStroke(major ? 1.4f : 0.7f));
            for (double[] s : segments) {
                g.draw(new Line2D.Double(frame.px(s[0]), frame.py(s[1]), frame.px(s[2]), frame.py(s[3])));
            }
            if (major) {
                contourLabels(frame, segments, PlotFrame.number(level), labelBoxes);
            }
        }
    }

    private void contourLabels(PlotFrame frame, List<double[]> segments, String text, List<double[]> boxes) {
        Graphics2D g = frame.graphics();
        g.setFont(PlotFrame.SMALL);
        FontMetrics fm = g.getFontMetrics();
        int placed = 0;
        for (int k = 0; k < segments.size() && placed < 3; k += 7) {
            double[] s = segments.get(k);
            double x = (frame.px(s[0]) + frame.px(s[2])) / 2;
            double y = (frame.py(s[1]) + frame.py(s[3])) / 2;
            double w = fm.stringWidth(text);
            double[] box = { x - w / 2 - 2, y - fm.getAscent() / 2.0 - 2, x + w / 2 + 2, y + fm.getAscent() / 2.0 + 2 };
            if (box[0] < frame.left() + 4 || box[2] > frame.right() - 4 || box[1] < frame.top() + 4
                    || box[3] > frame.bottom() - 4 || overlaps(box, boxes, 60)) {
                continue;
            }
            boxes.add(box);
            placed++;
            g.setColor(new Color(255, 255, 255, 200));
            g.fill(new java.awt.geom.Rectangle2D.Double(box[0], box[1], box[2] - box[0], box[3] - box[1]));
            g.setColor(Palette.INK);
            g.drawString(text, (float) (x - w / 2), (float) (y + fm.getAscent() / 2.0 - 1));
        }
    }

    private static boolean overlaps(double[] box, List<double[]> boxes, double gap) {
        for (double[] b : boxes) {
            if (box[0] < b[2] + gap && b[0] < box[2] + gap && box[1] < b[3] + gap && b[1] < box[3] + gap) {
                return true;
            }
        }
        return false;
    }

    private void outline(PlotFrame frame) {
        Path2D.Double path = new Path2D.Double();
        Coordinate[] ring = compartment.getExteriorRing().getCoordinates();
        for (int k = 0; k < ring.length; k++) {
            if (k == 0) {
                path.moveTo(frame.px(ring[k].x), frame.py(ring[k].y));
            } else {
                path.lineTo(frame.px(ring[k].x), frame.py(ring[k].y));
            }
        }
        path.closePath();
        Graphics2D g = frame.graphics();
        g.setColor(new Color(0xD5, 0x5E, 0x00, 35));
        g.fill(path);
        g.setColor(Palette.VERMILLION);
        g.setStroke(new BasicStroke(2.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] { 9f, 5f },
                0f));
        g.draw(path);
    }

    private void faultTraces(PlotFrame frame) {
        Graphics2D g = frame.graphics();
        for (Fault f : faults) {
            Coordinate[] c = f.trace().getCoordinates();
            Path2D.Double path = new Path2D.Double();
            path.moveTo(frame.px(c[0].x), frame.py(c[0].y));
            for (int k = 1; k < c.length; k++) {
                path.lineTo(frame.px(c[k].x), frame.py(c[k].y));
            }
            g.setColor(Palette.INK);
            g.setStroke(new BasicStroke(3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(path);
            // ticks on the downthrown (hanging-wall) side, every ~120 px
            g.setStroke(new BasicStroke(2f));
            double step = 120 * frame.xPerPixel() / 2;
            for (double u = step; u < f.length(); u += step) {
                Coordinate on = f.positionAt(u);
                Coordinate off = f.positionAt(u, org.faultbench.faults.Wall.HANGING_WALL, 9 * frame.xPerPixel());
                g.draw(new Line2D.Double(frame.px(on.x), frame.py(on.y), frame.px(off.x), frame.py(off.y)));
            }
            Coordinate end = c[c.length - 1];
            g.setFont(PlotFrame.TEXT.deriveFont(java.awt.Font.BOLD));
            haloText(g, f.name(), frame.px(end.x) + 6, frame.py(end.y) - 6);
        }
    }

    private void wells(PlotFrame frame) {
        Graphics2D g = frame.graphics();
        for (MapWell w : wells) {
            double x = frame.px(w.x());
            double y = frame.py(w.y());
            g.setColor(Color.WHITE);
            g.fill(new Ellipse2D.Double(x - 7, y - 7, 14, 14));
            g.setColor(Palette.INK);
            g.setStroke(new BasicStroke(2f));
            g.draw(new Ellipse2D.Double(x - 7, y - 7, 14, 14));
            g.fill(new Ellipse2D.Double(x - 3.5, y - 3.5, 7, 7));
            g.setFont(PlotFrame.TEXT.deriveFont(java.awt.Font.BOLD));
            haloText(g, w.name(), x + 10, y - 8);
        }
    }

    private static void haloText(Graphics2D g, String text, double x, double y) {
        FontMetrics fm = g.getFontMetrics();
        g.setColor(new Color(255, 255, 255, 210));
        g.fill(new java.awt.geom.Rectangle2D.Double(x - 2, y - fm.getAscent(), fm.stringWidth(text) + 4,
                fm.getAscent() + 3));
        g.setColor(Palette.INK);
        g.drawString(text, (float) x, (float) y);
    }

    private void scaleBar(PlotFrame frame) {
        double metres = Ticks.step(0, view.getWidth() / 4, 1);
        double pixels = metres / frame.xPerPixel();
        int x = frame.left() + 14;
        int y = frame.bottom() - 16;
        Graphics2D g = frame.graphics();
        g.setColor(new Color(255, 255, 255, 220));
        g.fillRect(x - 8, y - 24, (int) pixels + 70, 34);
        for (int k = 0; k < 4; k++) {
            g.setColor(k % 2 == 0 ? Palette.INK : Color.WHITE);
            g.fill(new java.awt.geom.Rectangle2D.Double(x + k * pixels / 4, y - 4, pixels / 4, 6));
        }
        g.setColor(Palette.INK);
        g.setStroke(new BasicStroke(1f));
        g.draw(new java.awt.geom.Rectangle2D.Double(x, y - 4, pixels, 6));
        g.setFont(PlotFrame.SMALL);
        g.drawString("0", x - 3, y - 8);
        g.drawString(PlotFrame.number(metres) + " m", (float) (x + pixels - 6), y - 8);
    }

    private void northArrow(PlotFrame frame) {
        int x = frame.right() - 30;
        int y = frame.top() + 20;
        Graphics2D g = frame.graphics();
        g.setColor(new Color(255, 255, 255, 220));
        g.fillRect(x - 16, y - 8, 32, 58);
        g.setColor(Palette.INK);
        g.fillPolygon(new Polygon(new int[] { x, x + 9, x, x - 9 }, new int[] { y + 6, y + 44, y + 34, y + 44 }, 4));
        g.setFont(PlotFrame.TEXT.deriveFont(java.awt.Font.BOLD));
        FontMetrics fm = g.getFontMetrics();
        g.drawString("N", x - fm.stringWidth("N") / 2f, y + 4);
    }

    private static void note(PlotFrame frame, String text) {
        Graphics2D g = frame.graphics();
        g.setFont(PlotFrame.SMALL);
        g.setColor(Palette.INK);
        g.drawString(text, frame.left(), frame.bottom() + 62);
    }
}
