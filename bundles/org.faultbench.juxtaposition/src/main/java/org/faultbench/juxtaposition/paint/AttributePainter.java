package org.faultbench.juxtaposition.paint;

import java.util.List;

/**
 * Colours the cells of an Allan diagram by some attribute (extension point
 * {@value AttributePainterContributions#POINT}). Colours are 0xRRGGBB integers so a painter is plain Java, tested
 * without a display; the viewer lists every painter in its "Colour by" choice.
 */
public interface AttributePainter {

    /** Stable id; must equal the extension's id. */
    String id();

    /** Shown in the viewer's colour choice. */
    String name();

    /** Colour of a cell with data (0xRRGGBB). */
    int rgb(FaultPlaneCell cell, PaintScene scene);

    /** The swatches explaining the colours, in display order. */
    List<LegendEntry> legend(PaintScene scene);
}
