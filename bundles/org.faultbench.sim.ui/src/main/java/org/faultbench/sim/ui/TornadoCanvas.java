package org.faultbench.sim.ui;

import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.faultbench.sim.TornadoBar;
import org.faultbench.ui.DisplayUnits;
import org.faultbench.ui.NumberText;

/**
 * Tornado chart of one unit's contact depth: a bar per input from the contact with the input at its P90 (low) to the
 * contact with it at its P10 (high), every other input at its median; the widest swing on top.
 */
final class TornadoCanvas extends Canvas {
    private static final int MAX_BARS = 10;
    private static final int ROW = 22;
    private static final int LABEL_WIDTH = 230;
    /** Low-case side teal, high-case side ochre: distinguishable for the common colour-vision deficiencies. */
    private static final int[] LOW_RGB = { 46, 139, 139 };
    private static final int[] HIGH_RGB = { 214, 150, 40 };

    private List<TornadoBar> bars = List.of();
    private double baseContact = Double.NaN;
    private String unit = "";

    TornadoCanvas(Composite parent) {
        super(parent, SWT.DOUBLE_BUFFERED);
        addPaintListener(e -> paint(e.gc));
    }

    void show(String unitName, double base, List<TornadoBar> newBars) {
        unit = unitName;
        baseContact = base;
        bars = newBars.subList(0, Math.min(MAX_BARS, newBars.size()));
        redraw();
    }

    private void paint(GC gc) {
        Rectangle area = getClientArea();
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_WIDGET_FOREGROUND));
        if (bars.isEmpty()) {
            gc.drawText("Tornado: run the simulation to rank the inputs by their effect on each unit's contact.", 6, 6,
                    true);
            return;
        }
        DisplayUnits units = DisplayUnits.current();
        gc.drawText("Contact of " + unit + " [" + units.lengthSymbol() + "]: input at P90 (low) \u2192 P10 (high),"
                + " others at median; base " + NumberText.of(units.length(baseContact), 1), 6, 4, true);
        double min = baseContact;
        double max = baseContact;
        for (TornadoBar b : bars) {
            min = Math.min(min, Math.min(b.contactWithLowInput(), b.contactWithHighInput()));
            max = Math.max(max, Math.max(b.contactWithLowInput(), b.contactWithHighInput()));
        }
        double span = Math.max(1e-9, max - min);
        int left = LABEL_WIDTH;
        int width = Math.max(40, area.width - left - 60);
        Color low = new Color(LOW_RGB[0], LOW_RGB[1], LOW_RGB[2]);
        Color high = new Color(HIGH_RGB[0], HIGH_RGB[1], HIGH_RGB[2]);
        int baseX = left + (int) Math.round(width * (baseContact - min) / span);
        for (int i = 0; i < bars.size(); i++) {
            TornadoBar b = bars.get(i);
            int y = 26 + i * ROW;
            gc.drawText(b.input(), 6, y + 2, true);
            drawHalf(gc, low, baseX, left + (int) Math.round(width * (b.contactWithLowInput() - min) / span), y);
            drawHalf(gc, high, baseX, left + (int) Math.round(width * (b.contactWithHighInput() - min) / span), y);
        }
        gc.drawLine(baseX, 22, baseX, 26 + bars.size() * ROW);
        gc.drawText(NumberText.of(units.length(min), 1), left, 30 + bars.size() * ROW, true);
        gc.drawText(NumberText.of(units.length(max), 1), left + width - 30, 30 + bars.size() * ROW, true);
    }

    private static void drawHalf(GC gc, Color colour, int from, int to, int y) {
        gc.setBackground(colour);
        gc.fillRectangle(Math.min(from, to), y + 3, Math.max(1, Math.abs(to - from)), ROW - 6);
    }
}
