package org.faultbench.juxtaposition.paint;

import java.util.List;

/**
 * Draws extra depth lines or labels on the Allan diagram (extension point {@value OverlayContributions#POINT}), e.g.
 * a regional contact or a pressure compartment boundary. Plain Java; the viewer draws the marks.
 */
public interface Overlay {

    /** Stable id; must equal the extension's id. */
    String id();

    /** Shown in the viewer's overlay menu. */
    String name();

    /** The marks for one fault; empty when there is nothing to show. */
    List<OverlayMark> marks(OverlayScene scene);
}
