package org.faultbench.digitize.ui.map;

import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.jface.action.Action;

/** Zooms so that the whole scan and every feature fit in the window. */
final class ZoomToFitAction extends Action {
    static final String ID = "org.faultbench.digitize.ui.zoomToFit";
    private final ZoomManager zoomManager;

    ZoomToFitAction(ZoomManager zoomManager) {
        super("Zoom to Fit");
        setId(ID);
        setToolTipText("Zoom to fit the whole map");
        this.zoomManager = zoomManager;
    }

    @Override
    public void run() {
        zoomManager.setZoomAsText(ZoomManager.FIT_ALL);
    }
}
