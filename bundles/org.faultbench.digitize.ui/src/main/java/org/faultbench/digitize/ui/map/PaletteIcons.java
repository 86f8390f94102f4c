package org.faultbench.digitize.ui.map;

import org.eclipse.jface.resource.ImageDescriptor;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.faultbench.digitize.ui.editing.DigitizeKind;

/**
 * The palette's 16 × 16 icons, drawn pixel by pixel in code in the map colours of each tool (no image files, no
 * display needed): a wavy contour, a fault with ticks, a filled polygon, dashed cut-offs, a crest triangle, a
 * well dot, a control-point cross.
 */
final class PaletteIcons {
    private static final int SIZE = 16;

    private PaletteIcons() {
    }

    static ImageDescriptor of(DigitizeKind kind) {
        Canvas c = new Canvas();
        switch (kind) {
            case CONTOUR -> {
                int[] ys = { 10, 8, 6, 5, 5, 6, 8, 9, 9, 8, 6, 5, 4, 4 };
                for (int x = 1; x < 14; x++) {
                    c.line(x, ys[x - 1], x + 1, ys[x], 204, 102, 0);
                }
            }
            case FAULT_TRACE -> {
                c.line(2, 13, 13, 2, 150, 20, 20);
                c.line(3, 13, 14, 2, 150, 20, 20);
                c.line(5, 10, 8, 13, 150, 20, 20);
                c.line(10, 5, 13, 8, 150, 20, 20);
            }
            case FAULT_POLYGON -> {
                for (int y = 4; y < 12; y++) {
                    c.line(3 + (12 - y) / 3, y, 12 - (y - 4) / 3, y, 240, 170, 160);
                }
                c.line(2, 12, 6, 3, 150, 20, 20);
                c.line(6, 3, 13, 4, 150, 20, 20);
                c.line(13, 4, 10, 12, 150, 20, 20);
                c.line(10, 12, 2, 12, 150, 20, 20);
            }
            case FOOTWALL_CUT_OFF -> dashed(c, 110, 40, 160);
            case HANGING_WALL_CUT_OFF -> dashed(c, 0, 120, 120);
            case MARKER -> {
                for (int y = 3; y < 13; y++) {
                    int half = (y - 3) / 2 + 1;
                    c.line(8 - half, y, 8 + half, y, 220, 150, 0);
                }
            }
            case WELL -> {
                for (int a = 0; a < 360; a += 5) {
                    double r = Math.toRadians(a);
                    for (double radius = 0; radius <= 4; radius += 0.5) {
                        c.set((int) Math.round(8 + radius * Math.cos(r)), (int) Math.round(8 + radius * Math.sin(r)),
                                20, 20, 20);
                    }
                }
                c.line(8, 1, 8, 15, 20, 20, 20);
            }
            case CONTROL_POINT -> {
                c.line(1, 8, 15, 8, 200, 0, 160);
                c.line(8, 1, 8, 15, 200, 0, 160);
                for (int a = 0; a < 360; a += 10) {
                    double r = Math.toRadians(a);
                    c.set((int) Math.round(8 + 4 * Math.cos(r)), (int) Math.round(8 + 4 * Math.sin(r)), 200, 0,
                            160);
                }
            }
        }
        return ImageDescriptor.createFromImageData(c.data);
    }

    private static void dashed(Canvas c, int r, int g, int b) {
        for (int x = 1; x < 15; x += 4) {
            c.line(x, 12 - x * 2 / 3, x + 2, 12 - (x + 2) * 2 / 3, r, g, b);
            c.line(x, 13 - x * 2 / 3, x + 2, 13 - (x + 2) * 2 / 3, r, g, b);
        }
    }

    /** A transparent 16 × 16 image with opaque pixels set by {@link #set} and {@link #line}. */
    private static final class Canvas {
        final ImageData data = new ImageData(SIZE, SIZE, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));

        Canvas() {
            data.alphaData = new byte[SIZE * SIZE];
        }

        void set(int x, int y, int r, int g, int b) {
            if (x >= 0 && y >= 0 && x < SIZE && y < SIZE) {
                data.setPixel(x, y, r << 16 | g << 8 | b);
                data.alphaData[y * SIZE + x] = (byte) 255;
            }
        }

        void line(int x0, int y0, int x1, int y1, int r, int g, int b) {
            int steps = Math.max(Math.abs(x1 - x0), Math.abs(y1 - y0));
            for (int i = 0; i <= steps; i++) {
                double t = steps == 0 ? 0 : (double) i / steps;
                set((int) Math.round(x0 + t * (x1 - x0)), (int) Math.round(y0 + t * (y1 - y0)), r, g, b);
            }
        }
    }
}
