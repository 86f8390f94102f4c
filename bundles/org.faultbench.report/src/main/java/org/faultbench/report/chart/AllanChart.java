package org.faultbench.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.Wall;
import org.faultbench.juxtaposition.AllanDiagram;
import org.faultbench.juxtaposition.AllanWindow;
import org.faultbench.juxtaposition.HungColumn;
import org.locationtech.jts.awt.ShapeWriter;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * Allan diagram (Allan 1989) of one fault as an image: the units of both walls on the unrolled fault plane
 * (footwall sands ochre, hanging-wall sands blue, seals grey), the reservoir/reservoir windows in vermillion,
 * each compartment sand's P90/P50/P10 contacts drawn across that sand on the compartment wall, and optionally the
 * well's drainage depth in the drained block.
 */
public final class AllanChart {
    public static final int WIDTH = 900;
    public static final int HEIGHT = 560;
    private static final int[] MARGINS = { 70, 34, 24, 96 };
    private static final double MARGIN_Z = 20;
    private static final float[][] DASHES = { { 10f, 5f }, null, { 3f, 4f } };
    private static final String[] LEVELS = { "P90", "P50", "P10" };

    private final AllanDiagram diagram;
    private final Wall compartmentWall;
    private final PlotFrame frame;
    private final ShapeWriter shapes;
    private final String title;

    public AllanChart(AllanDiagram diagram, Wall compartmentWall, String title) {
        this.diagram = diagram;
        this.compartmentWall = compartmentWall;
        this.title = title;
        FaultPlaneColumns columns = diagram.columns();
        double top = Double.POSITIVE_INFINITY;
        double base = Double.NEGATIVE_INFINITY;
        HungColumn fw = diagram.walls().footwall();
        for (int k = 0; k < columns.count(); k++) {
            if (columns.hasData(k)) {
                double shallow = Math.min(columns.footwallDepth(k), columns.hangingWallDepth(k));
                double deep = Math.max(columns.footwallDepth(k), columns.hangingWallDepth(k));
                top = Math.min(top, shallow + fw.topBelowReference(0));
                base = Math.max(base, deep + fw.topBelowReference(fw.size()));
            }
        }
        if (!(base > top)) {
            throw new IllegalArgumentException("Allan diagram of fault '" + columns.faultId()
                    + "': no column has cut-off depths on both walls");
        }
        double half = columns.width() / 2;
        this.frame = new PlotFrame(WIDTH, HEIGHT, MARGINS, columns.u(0) - half, columns.u(columns.count() - 1) + half,
                top - MARGIN_Z, base + MARGIN_Z, true);
        this.shapes = new ShapeWriter((src, dest) -> dest.setLocation(frame.px(src.x), frame.py(src.y)));
    }

    /** Pixel row at which depth z is drawn. */
    public double rowOf(double z) {
        return frame.py(z);
    }

    /** Pixel column at which along-strike distance u is drawn. */
    public double columnOf(double u) {
        return frame.px(u);
    }

    public BufferedImage render(List<ContactLevels> contacts, OptionalDouble drainageDepth, String drainageLabel) {
        Graphics2D g = frame.graphics();
        frame.clip();
        for (Wall wall : new Wall[] { Wall.FOOTWALL, Wall.HANGING_WALL }) {
            HungColumn column = diagram.walls().wall(wall);
            for (int unit = 0; unit < column.size(); unit++) {
                Shape shape = shapes.toShape(diagram.unitOutline(wall, unit));
                g.setColor(!column.isReservoir(unit) ? Palette.SEAL
                        : wall == Wall.FOOTWALL ? Palette.FOOTWALL_SAND : Palette.HANGING_WALL_SAND);
                g.fill(shape);
                g.setColor(wall == Wall.FOOTWALL ? new Color(0x8A, 0x6D, 0x1E) : new Color(0x1F, 0x5A, 0x8A));
                g.setStroke(new BasicStroke(0.8f));
                g.draw(shape);
            }
        }
        for (AllanWindow window : diagram.reservoirWindows()) {
            Shape shape = shapes.toShape(window.outline());
            g.setColor(new Color(0xD5, 0x5E, 0x00, 200));
            g.fill(shape);
        }
        frame.unclip();
        frame.axes(title, "distance along strike u [m]", "depth [m TVDSS]", false);
        frame.clip();
        List<double[]> labelBoxes = new ArrayList<>();
        for (ContactLevels c : contacts) {
            double[] levels = { c.p90(), c.p50(), c.p10() };
            for (int i = 0; i < levels.length; i++) {
                if (Double.isFinite(levels[i])) {
                    contactLine(c, i, levels[i], labelBoxes);
                }
            }
        }
        if (drainageDepth.isPresent()) {
            double y = frame.py(drainageDepth.getAsDouble());
            g.setColor(Palette.PURPLE);
            g.setStroke(new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] { 14f, 4f, 3f, 4f }, 0f));
            g.draw(new java.awt.geom.Line2D.Double(frame.left(), y, frame.right(), y));
            label(drainageLabel + String.format(Locale.ROOT, " %.1f m", drainageDepth.getAsDouble()), frame.left() + 6,
                    y - 4, Palette.PURPLE, labelBoxes);
        }
        frame.unclip();
        legend();
        return frame.finish();
    }

    /** The contact drawn only across the unit on the compartment wall, where that contact applies. */
    private void contactLine(ContactLevels c, int level, double z, List<double[]> labelBoxes) {
        Geometry outline = diagram.unitOutline(compartmentWall, c.unit());
        if (outline.isEmpty()) {
            return;
        }
        GeometryFactory factory = outline.getFactory();
        double u0 = diagram.columns().u(0) - diagram.columns().width();
        double u1 = diagram.columns().u(diagram.columns().count() - 1) + diagram.columns().width();
        LineString line = factory.createLineString(new Coordinate[] { new Coordinate(u0, z), new Coordinate(u1, z) });
        Geometry across = outline.intersection(line);
        if (across.isEmpty()) {
            return;
        }
        Graphics2D g = frame.graphics();
        g.setColor(Palette.GREEN);
        g.setStroke(new BasicStroke(2.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, DASHES[level], 0f));
        g.draw(shapes.toShape(across));
        String text = c.name() + " " + LEVELS[level];
        Color ink = new Color(0x00, 0x6B, 0x4E);
        double right = frame.px(across.getEnvelopeInternal().getMaxX());
        double left = frame.px(across.getEnvelopeInternal().getMinX());
        if (!label(text, right + 4, frame.py(z) + 4, ink, labelBoxes)) {
            frame.graphics().setFont(PlotFrame.SMALL);
            label(text, left - 4 - frame.graphics().getFontMetrics().stringWidth(text), frame.py(z) + 4, ink,
                    labelBoxes);
        }
    }

    /** A label with a white halo, skipped when it would overlap one already placed. */
    private boolean label(String text, double x, double y, Color colour, List<double[]> boxes) {
        Graphics2D g = frame.graphics();
        g.setFont(PlotFrame.SMALL);
        FontMetrics fm = g.getFontMetrics();
        double w = fm.stringWidth(text);
        x = Math.max(frame.left() + 2, Math.min(x, frame.right() - 2 - w));
        double[] box = { x - 2, y - fm.getAscent() - 1, x + w + 2, y + 3 };
        for (double[] b : boxes) {
            if (box[0] < b[2] && b[0] < box[2] && box[1] < b[3] && b[1] < box[3]) {
                return false;
            }
        }
        boxes.add(box);
        g.setColor(new Color(255, 255, 255, 210));
        g.fill(new java.awt.geom.Rectangle2D.Double(box[0], box[1], box[2] - box[0], box[3] - box[1]));
        g.setColor(colour);
        g.drawString(text, (float) x, (float) y);
        return true;
    }

    private void legend() {
        Graphics2D g = frame.graphics();
        g.setFont(PlotFrame.SMALL);
        int y = HEIGHT - 34;
        int x = frame.left();
        x = swatch(g, x, y, Palette.FOOTWALL_SAND, "footwall sand");
        x = swatch(g, x, y, Palette.HANGING_WALL_SAND, "hanging-wall sand");
        x = swatch(g, x, y, Palette.SEAL, "seal / non-reservoir");
        swatch(g, x, y, new Color(0xD5, 0x5E, 0x00, 200), "sand against sand (window)");
        y += 20;
        x = frame.left();
        for (int i = 0; i < 3; i++) {
            g.setColor(Palette.GREEN);
            g.setStroke(new BasicStroke(2.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, DASHES[i], 0f));
            g.drawLine(x, y - 4, x + 34, y - 4);
            g.setColor(Palette.INK);
            String text = LEVELS[i] + (i == 0 ? " contact (low case)" : i == 2 ? " contact (high case)" : " contact");
            g.drawString(text, x + 40, y);
            x += 54 + g.getFontMetrics().stringWidth(text);
        }
        g.setColor(Palette.PURPLE);
        g.setStroke(new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] { 14f, 4f, 3f, 4f }, 0f));
        g.drawLine(x, y - 4, x + 34, y - 4);
        g.setColor(Palette.INK);
        g.drawString("well drainage depth", x + 40, y);
    }

    private static int swatch(Graphics2D g, int x, int y, Color colour, String text) {
        g.setColor(colour);
        g.fillRect(x, y - 10, 16, 12);
        g.setColor(Palette.INK);
        g.setStroke(new BasicStroke(0.8f));
        g.drawRect(x, y - 10, 16, 12);
        g.drawString(text, x + 22, y);
        return x + 36 + g.getFontMetrics().stringWidth(text);
    }
}
