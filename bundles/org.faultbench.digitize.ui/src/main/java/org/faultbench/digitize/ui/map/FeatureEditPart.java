package org.faultbench.digitize.ui.map;

import org.eclipse.draw2d.IFigure;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editparts.AbstractGraphicalEditPart;
import org.eclipse.gef.editpolicies.ComponentEditPolicy;
import org.eclipse.gef.requests.GroupRequest;
import org.eclipse.swt.graphics.Color;
import org.eclipse.ui.views.properties.IPropertySource;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.ui.editing.FeatureEdits;
import org.faultbench.digitize.ui.editing.ScanProjection;
import org.faultbench.digitize.ui.editing.SheetEditCommand;
import org.locationtech.jts.geom.Coordinate;

/**
 * One feature of the sheet; its model is the feature's id, so the part (and the selection) survives edits that
 * replace the feature value. Lines get a handle per vertex; points are dragged whole.
 */
public final class FeatureEditPart extends AbstractGraphicalEditPart {

    public FeatureEditPart(FeatureId id) {
        setModel(id);
    }

    public FeatureId id() {
        return (FeatureId) getModel();
    }

    public SheetEditPart sheetPart() {
        return (SheetEditPart) getParent();
    }

    public MapSheet sheet() {
        return sheetPart().document().sheet();
    }

    /** The current value of the feature. */
    public SheetFeature feature() {
        return sheet().require(id());
    }

    @Override
    protected IFigure createFigure() {
        return new FeatureFigure(() -> sheetPart().zoom());
    }

    FeatureFigure featureFigure() {
        return (FeatureFigure) getFigure();
    }

    @Override
    protected void createEditPolicies() {
        installEditPolicy(EditPolicy.COMPONENT_ROLE, new ComponentEditPolicy() {
            @Override
            protected Command createDeleteCommand(GroupRequest request) {
                return SheetEditCommand.removing(sheet(), feature());
            }
        });
        // the primary drag role (vertex handles for lines) is installed by the sheet's layout policy
    }

    /** Whether the feature is a line (with vertex handles) rather than a point. */
    boolean isLine() {
        return feature().geometry().getNumPoints() > 1;
    }

    @Override
    protected void refreshVisuals() {
        if (sheet().find(id()).isEmpty()) {
            return;
        }
        SheetFeature feature = feature();
        ScanProjection projection = sheetPart().projection();
        Coordinate[] vertices = FeatureEdits.vertices(feature);
        double[] u = new double[vertices.length];
        double[] v = new double[vertices.length];
        for (int i = 0; i < vertices.length; i++) {
            double[] d = projection.toDrawing(vertices[i].x, vertices[i].y);
            u[i] = d[0];
            v[i] = d[1];
        }
        featureFigure().show(feature, u, v, colourOf(feature));
    }

    private Color colourOf(SheetFeature feature) {
        if (feature instanceof ContourFeature contour) {
            double shallowest = Double.MAX_VALUE;
            double deepest = -Double.MAX_VALUE;
            for (ContourFeature c : sheet().features(ContourFeature.class)) {
                shallowest = Math.min(shallowest, c.depth());
                deepest = Math.max(deepest, c.depth());
            }
            return MapColours.contour(contour.depth(), shallowest, deepest);
        }
        if (feature instanceof CutOffFeature cutOff) {
            return cutOff.wall() == Wall.FOOTWALL ? MapColours.FOOTWALL : MapColours.HANGING_WALL;
        }
        if (feature instanceof MarkerFeature marker) {
            return MapColours.marker(marker.kind());
        }
        return MapColours.FAULT;
    }

    @Override
    public void setSelected(int value) {
        super.setSelected(value);
        featureFigure().setSelected(value != SELECTED_NONE);
    }

    @Override
    public Object getAdapter(@SuppressWarnings("rawtypes") Class key) {
        if (key == IPropertySource.class) {
            return new FeaturePropertySource(sheet(), id());
        }
        return super.getAdapter(key);
    }
}
