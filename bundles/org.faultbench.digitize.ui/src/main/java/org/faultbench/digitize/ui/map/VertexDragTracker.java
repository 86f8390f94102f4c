package org.faultbench.digitize.ui.map;

import org.eclipse.gef.Request;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.tools.SimpleDragTracker;

/** Drags one vertex: sends a {@link MoveVertexRequest} with the pointer location to the feature's edit part. */
final class VertexDragTracker extends SimpleDragTracker {
    private final FeatureEditPart owner;
    private final int index;

    VertexDragTracker(FeatureEditPart owner, int index) {
        this.owner = owner;
        this.index = index;
    }

    @Override
    protected Request createSourceRequest() {
        return new MoveVertexRequest(index);
    }

    @Override
    protected void updateSourceRequest() {
        ((MoveVertexRequest) getSourceRequest()).setLocation(getLocation());
    }

    @Override
    protected Command getCommand() {
        return owner.getCommand(getSourceRequest());
    }

    @Override
    protected void showSourceFeedback() {
        owner.showSourceFeedback(getSourceRequest());
    }

    @Override
    protected void eraseSourceFeedback() {
        owner.eraseSourceFeedback(getSourceRequest());
    }

    @Override
    protected String getCommandName() {
        return MoveVertexRequest.TYPE;
    }
}
