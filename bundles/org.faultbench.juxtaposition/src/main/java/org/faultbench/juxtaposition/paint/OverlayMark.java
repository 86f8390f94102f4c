package org.faultbench.juxtaposition.paint;

import java.util.Objects;

/**
 * Something an overlay draws on the Allan diagram: a labelled depth line across the plane ({@link #depthLine}) or a
 * text at a point ({@link #label}).
 *
 * @param u along-strike position of a label, NaN for a depth line
 * @param rgb 0xRRGGBB
 */
public record OverlayMark(String text, double u, double z, int rgb, boolean dashed) {

    public OverlayMark {
        Objects.requireNonNull(text, "text");
        if (!Double.isFinite(z)) {
            throw new IllegalArgumentException("overlay mark '" + text + "' needs a finite depth, was " + z);
        }
    }

    public static OverlayMark depthLine(String label, double z, int rgb, boolean dashed) {
        return new OverlayMark(label, Double.NaN, z, rgb, dashed);
    }

    public static OverlayMark label(String text, double u, double z, int rgb) {
        if (!Double.isFinite(u)) {
            throw new IllegalArgumentException("label '" + text + "' needs a finite position u, was " + u);
        }
        return new OverlayMark(text, u, z, rgb, false);
    }

    public boolean isDepthLine() {
        return Double.isNaN(u);
    }
}
