package org.faultbench.digitize.ui.map;

import org.eclipse.gef.requests.LocationRequest;

/** Drag of one vertex handle of a line feature to a new (absolute, screen) location. */
public final class MoveVertexRequest extends LocationRequest {
    public static final String TYPE = "faultbench move vertex";

    private final int index;

    public MoveVertexRequest(int index) {
        super(TYPE);
        this.index = index;
    }

    public int index() {
        return index;
    }
}
