package org.faultbench.trap;

import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;

/** Input checks shared by the floods, so every entry point rejects the same mistakes with the same words. */
final class FloodChecks {

    private FloodChecks() {
    }

    /**
     * @param maskName what the mask is, for messages ("barrier mask")
     * @param blockedMeaning what a set node means, for messages ("a barrier node")
     */
    static void requireFloodable(RegularGrid top, GridMask blocked, String maskName, String blockedMeaning,
            Crest crest) {
        if (top == null || blocked == null || crest == null) {
            throw new IllegalArgumentException("depth grid, " + maskName + " or crest missing");
        }
        top.geometry().requireSame(blocked.geometry(), maskName);
        String node = "crest node (" + crest.i() + ", " + crest.j() + ")";
        if (!top.geometry().contains(crest.i(), crest.j())) {
            throw new IllegalArgumentException(node + " is outside the " + top.nx() + " x " + top.ny() + " grid");
        }
        int k = top.geometry().index(crest.i(), crest.j());
        if (top.isNull(k)) {
            throw new IllegalArgumentException(node + " is a null node of the depth grid");
        }
        if (blocked.contains(k)) {
            throw new IllegalArgumentException(node + " is " + blockedMeaning);
        }
    }
}
