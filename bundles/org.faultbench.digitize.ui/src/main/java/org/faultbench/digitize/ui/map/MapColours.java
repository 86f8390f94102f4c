package org.faultbench.digitize.ui.map;

import org.eclipse.swt.graphics.Color;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.ui.editing.DepthColours;

/**
 * Our own map palette, chosen to stay readable over a grey or cream scan: contours by depth (ochre to slate blue),
 * faults a heavy dark red, cut-offs violet (footwall) and teal (hanging wall), fault polygons a pale red fill,
 * markers by meaning and control points magenta. Colours without a device need no disposal (SWT 3.116 and later).
 */
final class MapColours {
    static final Color FAULT = new Color(150, 20, 20);
    static final Color POLYGON_FILL = new Color(230, 120, 110);
    static final Color FOOTWALL = new Color(110, 40, 160);
    static final Color HANGING_WALL = new Color(0, 120, 120);
    static final Color CONTROL_POINT = new Color(200, 0, 160);
    static final Color WORST_CONTROL_POINT = new Color(230, 30, 0);
    static final Color LABEL_HALO = new Color(255, 255, 240);
    static final Color WELL = new Color(20, 20, 20);
    static final Color FEEDBACK = new Color(255, 110, 0);
    static final Color SELECTED = new Color(0, 110, 255);

    private MapColours() {
    }

    static Color contour(double depth, double shallowest, double deepest) {
        int[] rgb = DepthColours.rgb(depth, shallowest, deepest);
        return new Color(rgb[0], rgb[1], rgb[2]);
    }

    static Color marker(MarkerKind kind) {
        return switch (kind) {
            case CREST -> new Color(220, 150, 0);
            case SPILL -> new Color(0, 90, 200);
            case LEAK -> new Color(200, 0, 0);
        };
    }
}
