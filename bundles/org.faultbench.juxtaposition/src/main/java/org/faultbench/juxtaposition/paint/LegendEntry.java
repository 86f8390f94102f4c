package org.faultbench.juxtaposition.paint;

/** One swatch of a painter's legend: a colour (0xRRGGBB) and what it means. */
public record LegendEntry(int rgb, String label) {

    public LegendEntry {
        if (rgb >>> 24 != 0) {
            throw new IllegalArgumentException("legend colour must be 0xRRGGBB, was 0x" + Integer.toHexString(rgb));
        }
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("legend entry needs a label");
        }
    }
}
