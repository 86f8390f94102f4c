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
import org.faultbench.juxtaposition.paint.AttributePainter;
import org.faultbench.juxtaposition.paint.BuiltInPainters;
import org.faultbench.juxtaposition.paint.LegendEntry;
import org.faultbench.juxtaposition.paint.Overlay;
import org.faultbench.juxtaposition.paint.OverlayMark;
import org.faultbench.juxtaposition.paint.Rgb;
import org.faultbench.ui.DisplayUnits;
import org.faultbench.ui.NumberText;

/**
 * Draws an {@link AllanPicture}: cells coloured by the chosen {@link AttributePainter} (a built-in or a contributed
 * one), footwall unit tops as solid lines and hanging-wall tops as dashed lines, horizontal depth lines (contacts,
 * drainage depth), the marks of the chosen overlays, axes and the painter's legend. Painters give 0xRRGGBB integers;
 * this class only turns them into SWT colours.
 */
final class AllanCanvas extends Canvas {
    private static final int LEFT = 70;
    private static final int TOP = 10;
    private static final int BOTTOM = 70;
    private static final int RIGHT = 20;

    /** A labelled horizontal depth line (e.g. "P50 contact"). */
    record DepthLine(String label, double z, RGB colour, int style) {
    }

    private AllanPicture picture;
    private AttributePainter painter = new BuiltInPainters.Juxtaposition();
    private List<Overlay> overlays = List.of();
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

    void paintBy(AttributePainter newPainter) {
        painter = newPainter;
        disposeImage();
        redraw();
    }

    void overlay(List<Overlay> chosen) {
        overlays = List.copyOf(chosen);
        redraw();
    }

    /** The overlays' marks as depth lines and labels; an overlay that fails is left out, the diagram still draws. */
    private List<OverlayMark> overlayMarks() {
        List<OverlayMark> marks = new ArrayList<>();
        for (Overlay overlay : overlays) {
            try {
                marks.addAll(overlay.marks(picture.overlayScene()));
            } catch (RuntimeException | LinkageError e) {
                org.eclipse.core.runtime.ILog.of(AllanCanvas.class).warn("overlay '" + overlay.id() + "' failed", e);
            }
        }
        return marks;
    }

    static RGB rgb(int packed) {
        return new RGB(Rgb.red(packed), Rgb.green(packed), Rgb.blue(packed));
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
        List<OverlayMark> marks = overlayMarks();
        drawDepthLines(gc, p, marks);
        drawOverlayLabels(gc, p, marks);
        drawAxes(gc, p);
        drawLegend(gc, p);
    }

    /** One pixel per raster cell, coloured by the painter; a painter that fails leaves its cells white. */
    private ImageData cellImage() {
        var raster = picture.raster;
        var scene = picture.paintScene();
        ImageData data = new ImageData(raster.columnCount(), raster.rowCount(), 24, new PaletteData(0xFF0000, 0xFF00, 0xFF));
        boolean failed = false;
        for (int k = 0; k < raster.columnCount(); k++) {
            for (int row = 0; row < raster.rowCount(); row++) {
                int colour = Rgb.WHITE;
                if (raster.hasData(k, row) && !failed) {
                    try {
                        colour = painter.rgb(picture.cell(k, row), scene) & 0xFFFFFF;
                    } catch (RuntimeException | LinkageError e) {
                        failed = true;
                        org.eclipse.core.runtime.ILog.of(AllanCanvas.class).warn("attribute painter '" + painter.id()
                                + "' failed", e);
                    }
                }
                data.setPixel(k, row, data.palette.getPixel(rgb(colour)));
            }
        }
        return data;
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

    private void drawDepthLines(GC gc, Rectangle p, List<OverlayMark> marks) {
        gc.setLineWidth(2);
        int labelled = 0;
        List<DepthLine> all = new ArrayList<>(lines);
        for (OverlayMark mark : marks) {
            if (mark.isDepthLine()) {
                all.add(new DepthLine(mark.text(), mark.z(), rgb(mark.rgb()),
                        mark.dashed() ? SWT.LINE_DASH : SWT.LINE_SOLID));
            }
        }
        DisplayUnits units = DisplayUnits.current();
        for (DepthLine line : all) {
            if (!Double.isFinite(line.z()) || line.z() < picture.zTop() || line.z() > picture.zBase()) {
                continue;
            }
            Color c = new Color(line.colour());
            gc.setForeground(c);
            gc.setLineStyle(line.style());
            int py = y(p, line.z());
            gc.drawLine(p.x, py, p.x + p.width, py);
            // labels alternate between the left and right ends so neighbouring lines stay readable
            String label = line.label() + " " + units.lengthText(line.z(), 1);
            int width = gc.textExtent(label).x;
            int lx = labelled++ % 2 == 0 ? p.x + 4 : p.x + p.width - width - 4;
            gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.drawText(label, lx, py - 16, false);
        }
        gc.setLineWidth(1);
        gc.setLineStyle(SWT.LINE_SOLID);
    }

    private void drawOverlayLabels(GC gc, Rectangle p, List<OverlayMark> marks) {
        for (OverlayMark mark : marks) {
            if (!mark.isDepthLine() && mark.z() >= picture.zTop() && mark.z() <= picture.zBase()
                    && mark.u() >= picture.uMin() && mark.u() <= picture.uMax()) {
                Color c = new Color(rgb(mark.rgb()));
                gc.setForeground(c);
                gc.drawText(mark.text(), x(p, mark.u()), y(p, mark.z()), true);
            }
        }
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_BLACK));
    }

    private void drawAxes(GC gc, Rectangle p) {
        DisplayUnits units = DisplayUnits.current();
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_BLACK));
        gc.drawRectangle(p);
        int ticks = 5;
        for (int i = 0; i <= ticks; i++) {
            double z = picture.zTop() + i * (picture.zBase() - picture.zTop()) / ticks;
            int py = y(p, z);
            gc.drawLine(p.x - 4, py, p.x, py);
            gc.drawText(NumberText.of(units.length(z), 0), 4, py - 7, true);
            double u = picture.uMin() + i * (picture.uMax() - picture.uMin()) / ticks;
            int px = x(p, u);
            gc.drawLine(px, p.y + p.height, px, p.y + p.height + 4);
            gc.drawText(NumberText.of(units.length(u), 0), px - 12, p.y + p.height + 5, true);
        }
        String symbol = units.lengthSymbol();
        gc.drawText("depth [" + symbol + " TVDSS]", 4, p.y + p.height + 5, true);
        gc.drawText("distance along strike u [" + symbol + "] \u2014 fault " + picture.faultId
                + " seen from the hanging wall; solid: footwall unit tops, dashed: hanging-wall unit tops",
                p.x + 60, p.y + p.height + 22, true);
    }

    private void drawLegend(GC gc, Rectangle p) {
        int y = p.y + p.height + 42;
        int x = p.x;
        List<LegendEntry> legend;
        try {
            legend = painter.legend(picture.paintScene());
        } catch (RuntimeException | LinkageError e) {
            legend = List.of(new LegendEntry(Rgb.WHITE, painter.name() + ": no legend (painter failed)"));
        }
        for (LegendEntry entry : legend) {
            x = swatch(gc, x, y, rgb(entry.rgb()), entry.label());
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
