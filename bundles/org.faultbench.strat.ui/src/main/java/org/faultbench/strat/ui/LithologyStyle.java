package org.faultbench.strat.ui;

import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.graphics.Rectangle;
import org.faultbench.core.LithologyClass;

/**
 * How each lithology class is drawn in the column plot: a pale ground colour and a simple ornament of our own
 * (dots for sand, short dashes for shale, offset bricks for carbonate, crosses for evaporite), readable in print and
 * without colour.
 */
enum LithologyStyle {
    RESERVOIR(new RGB(246, 222, 150), new RGB(150, 110, 30)),
    SEAL(new RGB(196, 206, 196), new RGB(70, 90, 70)),
    CARBONATE(new RGB(186, 214, 236), new RGB(40, 90, 140)),
    EVAPORITE(new RGB(236, 196, 226), new RGB(140, 60, 120)),
    OTHER(new RGB(225, 225, 225), new RGB(110, 110, 110));

    final RGB ground;
    final RGB ornament;

    LithologyStyle(RGB ground, RGB ornament) {
        this.ground = ground;
        this.ornament = ornament;
    }

    static LithologyStyle of(LithologyClass lithology) {
        return switch (lithology) {
        case RESERVOIR -> RESERVOIR;
        case SEAL -> SEAL;
        case CARBONATE -> CARBONATE;
        case EVAPORITE -> EVAPORITE;
        default -> OTHER;
        };
    }

    /** Draws the ornament inside {@code r}; the caller has set the foreground colour and clipping. */
    void ornament(GC gc, Rectangle r) {
        switch (this) {
        case RESERVOIR -> {
            for (int y = r.y + 3, row = 0; y < r.y + r.height; y += 6, row++) {
                for (int x = r.x + 3 + (row % 2) * 4; x < r.x + r.width; x += 8) {
                    gc.drawPoint(x, y);
                    gc.drawPoint(x + 1, y);
                }
            }
        }
        case SEAL -> {
            for (int y = r.y + 4, row = 0; y < r.y + r.height; y += 6, row++) {
                for (int x = r.x + 2 + (row % 2) * 6; x < r.x + r.width; x += 12) {
                    gc.drawLine(x, y, x + 6, y);
                }
            }
        }
        case CARBONATE -> {
            for (int y = r.y, row = 0; y < r.y + r.height; y += 8, row++) {
                gc.drawLine(r.x, y, r.x + r.width, y);
                for (int x = r.x + (row % 2) * 8; x < r.x + r.width; x += 16) {
                    gc.drawLine(x, y, x, Math.min(y + 8, r.y + r.height));
                }
            }
        }
        case EVAPORITE -> {
            for (int y = r.y + 5; y < r.y + r.height; y += 10) {
                for (int x = r.x + 5; x < r.x + r.width; x += 10) {
                    gc.drawLine(x - 2, y - 2, x + 2, y + 2);
                    gc.drawLine(x - 2, y + 2, x + 2, y - 2);
                }
            }
        }
        default -> {
            for (int d = 0; d < r.width + r.height; d += 10) {
                gc.drawLine(r.x + d, r.y, r.x + d - r.height, r.y + r.height);
            }
        }
        }
    }
}
