package org.faultbench.digitize.ui.map;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.draw2d.IFigure;
import org.eclipse.draw2d.Polyline;
import org.eclipse.draw2d.geometry.PointList;
import org.eclipse.draw2d.geometry.PrecisionPoint;
import org.eclipse.gef.Request;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editpolicies.NonResizableEditPolicy;
import org.faultbench.digitize.ui.editing.FeatureEdits;
import org.faultbench.digitize.ui.editing.SheetEditCommand;
import org.locationtech.jts.geom.Coordinate;

/**
 * Selection of a line feature: a square handle on every vertex; dragging a handle moves that vertex (snapped to
 * the other features) through a {@link SheetEditCommand}; dragging the line itself moves the whole feature.
 */
final class VertexHandlesPolicy extends NonResizableEditPolicy {
    private Polyline feedback;

    private FeatureEditPart part() {
        return (FeatureEditPart) getHost();
    }

    @Override
    protected List<Object> createSelectionHandles() {
        List<Object> handles = new ArrayList<>();
        for (int i = 0; i < part().featureFigure().vertexCount(); i++) {
            handles.add(new VertexHandle(part(), i));
        }
        return handles;
    }

    @Override
    public boolean understandsRequest(Request request) {
        return MoveVertexRequest.TYPE.equals(request.getType()) || super.understandsRequest(request);
    }

    @Override
    public Command getCommand(Request request) {
        if (request instanceof MoveVertexRequest move) {
            PrecisionPoint drawing = part().sheetPart().toDrawing(move.getLocation());
            Coordinate at = part().sheetPart().snapped(drawing.preciseX, drawing.preciseY, part().id());
            return SheetEditCommand.replacing(part().sheet(),
                    FeatureEdits.withVertex(part().feature(), move.index(), at.x, at.y));
        }
        return super.getCommand(request);
    }

    @Override
    public void showSourceFeedback(Request request) {
        if (!(request instanceof MoveVertexRequest move)) {
            super.showSourceFeedback(request);
            return;
        }
        if (feedback == null) {
            feedback = new Polyline();
            feedback.setForegroundColor(MapColours.FEEDBACK);
            feedback.setLineWidth(2);
            addFeedback(feedback);
        }
        FeatureFigure figure = part().featureFigure();
        PointList points = new PointList();
        for (int i = 0; i < figure.vertexCount(); i++) {
            PrecisionPoint p = new PrecisionPoint(figure.vertex(i).x, figure.vertex(i).y);
            figure.translateToAbsolute(p);
            points.addPoint(i == move.index() ? move.getLocation() : p);
        }
        IFigure layer = getFeedbackLayer();
        layer.translateToRelative(points);
        feedback.setPoints(points);
    }

    @Override
    public void eraseSourceFeedback(Request request) {
        if (request instanceof MoveVertexRequest) {
            if (feedback != null) {
                removeFeedback(feedback);
                feedback = null;
            }
            return;
        }
        super.eraseSourceFeedback(request);
    }
}
