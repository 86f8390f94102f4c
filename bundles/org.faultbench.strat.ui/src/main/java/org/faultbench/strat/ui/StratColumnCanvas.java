package org.faultbench.strat.ui;

import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.faultbench.strat.StratUnit;
import org.faultbench.ui.DisplayUnits;
import org.faultbench.ui.NumberText;

/**
 * The stratigraphic column drawn to scale from the units' nominal thicknesses, with lithology ornament, unit names,
 * a depth scale below the reference top and a bar beside each unit spanning its P90-P10 thickness range, so thin
 * uncertain beds are seen as such. The selected unit is outlined.
 */
final class StratColumnCanvas extends Canvas {
    private static final int MARGIN = 10;
    private static final int SCALE_WIDTH = 44;
    private static final int COLUMN_WIDTH = 90;
    private List<StratUnit> units = List.of();
    private int referenceIndex;
    private int selected = -1;

    StratColumnCanvas(Composite parent) {
        super(parent, SWT.DOUBLE_BUFFERED);
        addPaintListener(e -> paint(e.gc));
    }

    void show(List<StratUnit> newUnits, int newReferenceIndex) {
        units = List.copyOf(newUnits);
        referenceIndex = newReferenceIndex;
        redraw();
    }

    void select(int index) {
        selected = index;
        redraw();
    }

    private void paint(GC gc) {
        Rectangle area = getClientArea();
        gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
        gc.fillRectangle(area);
        double total = units.stream().mapToDouble(u -> u.thickness().nominal()).sum();
        if (units.isEmpty() || total <= 0) {
            return;
        }
        double scale = (area.height - 2.0 * MARGIN) / total;
        int x = area.x + MARGIN + SCALE_WIDTH;
        double top = 0;
        double referenceTop = 0;
        for (int i = 0; i < referenceIndex; i++) {
            referenceTop += units.get(i).thickness().nominal();
        }
        gc.setAntialias(SWT.ON);
        DisplayUnits display = DisplayUnits.current();
        for (int i = 0; i < units.size(); i++) {
            StratUnit unit = units.get(i);
            double thickness = unit.thickness().nominal();
            int y0 = MARGIN + (int) Math.round(top * scale);
            int y1 = MARGIN + (int) Math.round((top + thickness) * scale);
            drawUnit(gc, unit, new Rectangle(x, y0, COLUMN_WIDTH, Math.max(1, y1 - y0)), i == selected);
            drawRange(gc, unit, x + COLUMN_WIDTH + 6, y0, scale);
            gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_BLACK));
            String label = unit.name() + (i == referenceIndex ? "  \u25C0 mapped top" : "");
            gc.drawText(label, x + COLUMN_WIDTH + 14, (y0 + y1) / 2 - gc.getFontMetrics().getHeight() / 2, true);
            gc.drawText(NumberText.of(display.length(top - referenceTop), 0), area.x + MARGIN, y0 - 6, true);
            top += thickness;
        }
        gc.drawText(display.lengthText(top - referenceTop, 0), area.x + MARGIN,
                MARGIN + (int) Math.round(top * scale) - 6, true);
    }

    private void drawUnit(GC gc, StratUnit unit, Rectangle r, boolean isSelected) {
        LithologyStyle style = LithologyStyle.of(unit.lithology());
        Color ground = new Color(style.ground);
        Color ornament = new Color(style.ornament);
        gc.setBackground(ground);
        gc.fillRectangle(r);
        gc.setClipping(r);
        gc.setForeground(ornament);
        style.ornament(gc, r);
        gc.setClipping((Rectangle) null);
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        gc.setLineWidth(isSelected ? 3 : 1);
        gc.drawRectangle(r);
        gc.setLineWidth(1);
    }

    /** A thin bar from the P90 to the P10 thickness, measured from the unit's top (exceedance convention). */
    private void drawRange(GC gc, StratUnit unit, int x, int y0, double scale) {
        double low = unit.thickness().quantile(0.10);
        double high = unit.thickness().quantile(0.90);
        if (high - low <= 0) {
            return;
        }
        int ya = y0 + (int) Math.round(low * scale);
        int yb = y0 + (int) Math.round(high * scale);
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_BLUE));
        gc.drawLine(x, ya, x, yb);
        gc.drawLine(x - 2, ya, x + 2, ya);
        gc.drawLine(x - 2, yb, x + 2, yb);
    }
}
