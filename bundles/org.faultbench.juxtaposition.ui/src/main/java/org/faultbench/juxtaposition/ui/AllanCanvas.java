package org.faultbench.juxtaposition.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.faultbench.juxtaposition.JuxtapositionClass;
import org.faultbench.ui.NumberText;

/**
 * Draws an {@link AllanPicture}: juxtaposition classes as colours, footwall unit tops as solid lines and hanging-wall
 * tops as dashed lines, leak probability blended in violet, horizontal depth lines (contacts, drainage depth), axes and
 * a legend. Our own palette: reservoir against reservoir in burnt orange, reservoir against seal in pale sand, seal
 * against seal in grey-green.
 */
final class AllanCanvas extends Canvas {
    static final RGB RESERVOIR_RESERVOIR = new RGB(217, 95, 2);
    static final RGB RESERVOIR_SEAL = new RGB(240, 225, 175);
    static final RGB SEAL_SEAL = new RGB(170, 180, 165);
    static final RGB LEAK = new RGB(117, 52, 160);
    private static final int LEFT = 70;
    private static final int TOP = 10;
    private static final int BOTTOM = 70;
    private static final int RIGHT = 20;

    /** A labelled horizontal depth line (e.g. "P50 contact"). */
    record DepthLine(String label, double z, RGB colour, int style) {
    }

    /** What the cells are coloured by. */
    enum Paint {
        JUXTAPOSITION("juxtaposition"), SEAL_ATTRIBUTE("seal attribute"), LEAK_PROBABILITY("leak probability");

        final String label;

        Paint(String label) {
            this.label = label;
        }
    }

    private AllanPicture picture;
    private Paint paintMode = Paint.JUXTAPOSITION;
    private Image image;
    private final List<DepthLine> lines = new ArrayList<>();

    AllanCanvas(Composite parent) {
        super(parent, SWT.DOUBLE_BUFFERED);
        addPaintListener(e -> paint(e.gc));
        addDisposeListener(e -> disposeImage());
    }

    void show(AllanPicture newPicture, List<DepthLine> depthLines) {
        picture = newPicture;
        lines.clear();
        lines.addAll(depthLines);
        disposeImage();
        redraw();
    }

    void paintBy(Paint mode) {
        paintMode = mode;
        disposeImage();
        redraw();
    }

    AllanPicture picture() {
        return picture;
    }

    private void disposeImage() {
        if (image != null) {
            image.dispose();
            image = null;
        }
    }

    private Rectangle plotArea() {
        Rectangle a = getClientArea();
        return new Rectangle(LEFT, TOP, Math.max(10, a.width - LEFT - RIGHT), Math.max(10, a.height - TOP - BOTTOM));
    }

    /** Column index and depth under a canvas point, or null outside the plot. */
    double[] toPlane(int x, int y) {
        Rectangle p = plotArea();
        if (picture == null || !p.contains(x, y)) {
            return null;
        }
        double u = picture.uMin() + (x - p.x) * (picture.uMax() - picture.uMin()) / p.width;
        double z = picture.zTop() + (y - p.y) * (picture.zBase() - picture.zTop()) / p.height;
        int k = (int) Math.floor((u - picture.uMin()) / picture.columns.width());
        return new double[] { k, z };
    }

    private void paint(GC gc) {
        if (picture == null) {
            gc.drawText("No study open: the Allan diagram of each bounding fault appears here.", 10, 10, true);
            return;
        }
        Rectangle p = plotArea();
        if (image == null) {
            image = new Image(getDisplay(), cellImage());
        }
        gc.setInterpolation(SWT.NONE);
        Rectangle b = image.getBounds();
        gc.drawImage(image, 0, 0, b.width, b.height, p.x, p.y, p.width, p.height);
        drawUnitTops(gc, p);
        drawDepthLines(gc, p);
        drawAxes(gc, p);
        drawLegend(gc, p);
    }

    /** One pixel per raster cell, coloured by juxtaposition class and blended with leak probability. */
    private ImageData cellImage() {
        var raster = picture.raster;
        ImageData data = new ImageData(raster.columnCount(), raster.rowCount(), 24, new PaletteData(0xFF0000, 0xFF00, 0xFF));
        for (int k = 0; k < raster.columnCount(); k++) {
            for (int row = 0; row < raster.rowCount(); row++) {
                RGB colour = new RGB(255, 255, 255);
                if (raster.hasData(k, row)) {
                    colour = cellColour(k, row);
                }
                data.setPixel(k, row, data.palette.getPixel(colour));
            }
        }
        return data;
    }

    private RGB cellColour(int k, int row) {
        var raster = picture.raster;
        JuxtapositionClass c = raster.juxtapositionClass(k, row);
        RGB juxtaposition = c == JuxtapositionClass.RESERVOIR_RESERVOIR ? RESERVOIR_RESERVOIR
                : c == JuxtapositionClass.RESERVOIR_SEAL ? RESERVOIR_SEAL : SEAL_SEAL;
        double p = picture.leakProbability(k, raster.rowDepth(row));
        switch (paintMode) {
        case SEAL_ATTRIBUTE:
            double value = picture.attributeAt(k, row);
            // a clay-fraction attribute in % on a white-to-slate ramp; cells without fault rock keep their class
            return Double.isNaN(value) ? blend(juxtaposition, new RGB(255, 255, 255), 0.6)
                    : blend(new RGB(250, 250, 240), new RGB(40, 60, 90), Math.max(0, Math.min(1, value / 60)));
        case LEAK_PROBABILITY:
            return blend(blend(juxtaposition, new RGB(255, 255, 255), 0.7), LEAK, p);
        default:
            return blend(juxtaposition, LEAK, 0.85 * p);
        }
    }

    static RGB blend(RGB a, RGB b, double t) {
        return new RGB((int) Math.round(a.red + t * (b.red - a.red)), (int) Math.round(a.green + t * (b.green - a.green)),
                (int) Math.round(a.blue + t * (b.blue - a.blue)));
    }

    private int x(Rectangle p, double u) {
        return p.x + (int) Math.round(p.width * (u - picture.uMin()) / (picture.uMax() - picture.uMin()));
    }

    private int y(Rectangle p, double z) {
        return p.y + (int) Math.round(p.height * (z - picture.zTop()) / (picture.zBase() - picture.zTop()));
    }

    private void drawUnitTops(GC gc, Rectangle p) {
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_BLACK));
        for (boolean footwall : new boolean[] { true, false }) {
            gc.setLineStyle(footwall ? SWT.LINE_SOLID : SWT.LINE_DASH);
            for (int unit = 0; unit <= picture.column.size(); unit++) {
                int lastX = -1;
                int lastY = -1;
                for (int k = 0; k < picture.columns.count(); k++) {
                    if (!picture.columns.hasData(k)) {
                        lastX = -1;
                        continue;
                    }
                    double z = unit < picture.column.size() ? picture.unitTop(k, unit, footwall)
                            : picture.unitTop(k, unit - 1, footwall) + picture.column.unit(unit - 1).thickness();
                    int px = x(p, picture.columns.u(k));
                    int py = y(p, z);
                    if (lastX >= 0) {
                        gc.drawLine(lastX, lastY, px, py);
                    }
                    lastX = px;
                    lastY = py;
                }
            }
        }
        gc.setLineStyle(SWT.LINE_SOLID);
    }

    private void drawDepthLines(GC gc, Rectangle p) {
        gc.setLineWidth(2);
        int labelled = 0;
        for (DepthLine line : lines) {
            if (!Double.isFinite(line.z()) || line.z() < picture.zTop() || line.z() > picture.zBase()) {
                continue;
            }
            Color c = new Color(line.colour());
            gc.setForeground(c);
            gc.setLineStyle(line.style());
            int py = y(p, line.z());
            gc.drawLine(p.x, py, p.x + p.width, py);
            // labels alternate between the left and right ends so neighbouring lines stay readable
            String label = line.label() + " " + NumberText.of(line.z(), 1) + " m";
            int width = gc.textExtent(label).x;
            int lx = labelled++ % 2 == 0 ? p.x + 4 : p.x + p.width - width - 4;
            gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.drawText(label, lx, py - 16, false);
        }
        gc.setLineWidth(1);
        gc.setLineStyle(SWT.LINE_SOLID);
    }

    private void drawAxes(GC gc, Rectangle p) {
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_BLACK));
        gc.drawRectangle(p);
        int ticks = 5;
        for (int i = 0; i <= ticks; i++) {
            double z = picture.zTop() + i * (picture.zBase() - picture.zTop()) / ticks;
            int py = y(p, z);
            gc.drawLine(p.x - 4, py, p.x, py);
            gc.drawText(NumberText.of(z, 0), 4, py - 7, true);
            double u = picture.uMin() + i * (picture.uMax() - picture.uMin()) / ticks;
            int px = x(p, u);
            gc.drawLine(px, p.y + p.height, px, p.y + p.height + 4);
            gc.drawText(NumberText.of(u, 0), px - 12, p.y + p.height + 5, true);
        }
        gc.drawText("depth [m TVDSS]", 4, p.y + p.height + 5, true);
        gc.drawText("distance along strike u [m] \u2014 fault " + picture.faultId
                + " seen from the hanging wall; solid: footwall unit tops, dashed: hanging-wall unit tops",
                p.x + 60, p.y + p.height + 22, true);
    }

    private void drawLegend(GC gc, Rectangle p) {
        int y = p.y + p.height + 42;
        int x = p.x;
        x = swatch(gc, x, y, RESERVOIR_RESERVOIR, "reservoir/reservoir window");
        x = swatch(gc, x, y, RESERVOIR_SEAL, "reservoir/seal");
        x = swatch(gc, x, y, SEAL_SEAL, "seal/seal");
        x = swatch(gc, x, y, LEAK, picture.leak == null ? "leak probability (after a run)" : "leak probability (0\u2013100 %)");
        if (paintMode == Paint.SEAL_ATTRIBUTE && picture.sealAttribute != null) {
            swatch(gc, x, y, new RGB(40, 60, 90), picture.sealAttribute + " 0 (pale) \u2013 60+ (slate)");
        }
    }

    private int swatch(GC gc, int x, int y, RGB rgb, String label) {
        Color c = new Color(rgb);
        gc.setBackground(c);
        gc.fillRectangle(x, y + 2, 14, 12);
        gc.drawRectangle(x, y + 2, 14, 12);
        gc.drawText(label, x + 18, y, true);
        return x + 26 + gc.textExtent(label).x;
    }
}
