package org.faultbench.digitize.ui.map;

import org.eclipse.draw2d.ConnectionLayer;
import org.eclipse.draw2d.FreeformLayer;
import org.eclipse.draw2d.FreeformLayeredPane;
import org.eclipse.draw2d.LayeredPane;
import org.eclipse.gef.editparts.ScalableFreeformRootEditPart;

/** The zoomable root of the map viewer, with a raster layer under the features so the scan is never on top. */
public final class MapRootEditPart extends ScalableFreeformRootEditPart {
    /** Layer key of the scan tiles. */
    public static final String RASTER_LAYER = "Faultbench raster layer";

    @Override
    protected LayeredPane createPrintableLayers() {
        FreeformLayeredPane layers = new FreeformLayeredPane();
        layers.add(new FreeformLayer(), RASTER_LAYER);
        layers.add(new FreeformLayer(), PRIMARY_LAYER);
        layers.add(new ConnectionLayer(), CONNECTION_LAYER);
        return layers;
    }
}
