package org.faultbench.digitize.ui.map;

import org.eclipse.draw2d.Figure;
import org.eclipse.draw2d.Graphics;
import org.eclipse.draw2d.IFigure;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editparts.AbstractGraphicalEditPart;
import org.eclipse.gef.editpolicies.ComponentEditPolicy;
import org.eclipse.gef.editpolicies.NonResizableEditPolicy;
import org.eclipse.gef.requests.GroupRequest;
import org.eclipse.swt.SWT;
import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.ui.editing.ControlPointCommand;
import org.faultbench.digitize.ui.editing.Georeference;

/**
 * A control point on the scan: a magenta cross in a circle with its id, drawn at its pixel; the worst point of the
 * fit in red, a disabled point hollow and grey-dashed. Dragging it moves the pixel (the map position stays).
 */
public final class ControlPointEditPart extends AbstractGraphicalEditPart {
    private static final int RADIUS = 7;

    public ControlPointEditPart(ControlPointKey key) {
        setModel(key);
    }

    public ControlPointKey key() {
        return (ControlPointKey) getModel();
    }

    Georeference georeference() {
        return ((SheetEditPart) getParent()).document().georeference();
    }

    public ControlPoint point() {
        return georeference().find(key().id())
                .orElseThrow(() -> new IllegalStateException("control point '" + key().id() + "' is gone"));
    }

    @Override
    protected IFigure createFigure() {
        return new CrossFigure();
    }

    @Override
    protected void createEditPolicies() {
        installEditPolicy(EditPolicy.COMPONENT_ROLE, new ComponentEditPolicy() {
            @Override
            protected Command createDeleteCommand(GroupRequest request) {
                return ControlPointCommand.removing(georeference(), point());
            }
        });
        installEditPolicy(EditPolicy.PRIMARY_DRAG_ROLE, new NonResizableEditPolicy());
    }

    @Override
    protected void refreshVisuals() {
        if (georeference().find(key().id()).isEmpty()) {
            return;
        }
        ControlPoint point = point();
        double zoom = ((SheetEditPart) getParent()).zoom();
        int r = (int) Math.ceil(RADIUS / Math.min(1, zoom));
        int u = (int) Math.round(point.col() + 0.5);
        int v = (int) Math.round(point.row() + 0.5);
        CrossFigure figure = (CrossFigure) getFigure();
        figure.id = point.id();
        figure.enabled = point.enabled();
        figure.worst = georeference().fit().filter(f -> f.residuals().size() > f.transform().kind().minimumPoints())
                .map(f -> f.worstPoint().point().id().equals(point.id())).orElse(false);
        figure.zoom = zoom;
        figure.setBounds(new Rectangle(u - r, v - r, 2 * r + 1 + (int) Math.ceil(60 / Math.min(1, zoom)),
                2 * r + 1));
        figure.repaint();
    }

    /** The drawn symbol; its centre is the point's pixel, the label runs to the right. */
    private static final class CrossFigure extends Figure {
        String id = "";
        boolean enabled = true;
        boolean worst;
        double zoom = 1;

        @Override
        protected void paintFigure(Graphics g) {
            Rectangle b = getBounds();
            int r = (b.height - 1) / 2;
            int cx = b.x + r;
            int cy = b.y + r;
            g.setAntialias(SWT.ON);
            g.setForegroundColor(worst ? MapColours.WORST_CONTROL_POINT : MapColours.CONTROL_POINT);
            g.setLineWidth(FeatureFigure.width(2));
            g.setLineStyle(enabled ? SWT.LINE_SOLID : SWT.LINE_DOT);
            g.drawOval(cx - r / 2, cy - r / 2, r, r);
            g.drawLine(cx - r, cy, cx + r, cy);
            g.drawLine(cx, cy - r, cx, cy + r);
            g.setLineStyle(SWT.LINE_SOLID);
            g.drawText(id, cx + r + 2, cy - r);
        }
    }
}
