package org.faultbench.digitize.ui.map;

import java.util.List;

import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.PrecisionPoint;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.Request;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.commands.CompoundCommand;
import org.eclipse.gef.editpolicies.LayoutEditPolicy;
import org.eclipse.gef.editpolicies.NonResizableEditPolicy;
import org.eclipse.gef.requests.ChangeBoundsRequest;
import org.eclipse.gef.requests.CreateRequest;
import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.WellFeature;
import org.faultbench.digitize.ui.editing.ControlPointCommand;
import org.faultbench.digitize.ui.editing.DigitizeKind;
import org.faultbench.digitize.ui.editing.FeatureEdits;
import org.faultbench.digitize.ui.editing.Georeference;
import org.faultbench.digitize.ui.editing.MapDocument;
import org.faultbench.digitize.ui.editing.ScanProjection;
import org.faultbench.digitize.ui.editing.SheetEditCommand;
import org.locationtech.jts.geom.Coordinate;

/**
 * Turns gestures on the sheet into commands: a finished digitizing gesture adds a feature (the next contour value is
 * stepped when the command runs) or a control point; dragging selected features or control points moves them by the
 * drag converted to drawing units.
 */
final class SheetLayoutPolicy extends LayoutEditPolicy {

    private SheetEditPart sheetPart() {
        return (SheetEditPart) getHost();
    }

    @Override
    public Command getCommand(Request request) {
        if (request instanceof DigitizeRequest digitize) {
            return digitizeCommand(digitize);
        }
        return super.getCommand(request);
    }

    @Override
    public boolean understandsRequest(Request request) {
        return request instanceof DigitizeRequest || super.understandsRequest(request);
    }

    private Command digitizeCommand(DigitizeRequest request) {
        MapDocument document = sheetPart().document();
        if (request.kind() == DigitizeKind.CONTROL_POINT) {
            double[] d = request.firstDrawingPoint();
            Georeference georeference = document.georeference();
            double[] map = georeference.projection().toMap(d[0], d[1]);
            return ControlPointCommand.adding(georeference,
                    ControlPoint.of(georeference.nextId(), d[0] - 0.5, d[1] - 0.5, map[0], map[1]));
        }
        MapSheet sheet = document.sheet();
        SheetFeature feature = FeatureEdits.create(request.kind(), sheet.nextId(), request.mapPoints(),
                document.defaults());
        SheetEditCommand add = SheetEditCommand.adding(sheet, feature);
        if (feature instanceof ContourFeature contour) {
            return steppingDefaults(add, () -> document.defaults().contourDrawn(contour.depth()));
        }
        if (feature instanceof WellFeature well) {
            return steppingDefaults(add, () -> document.defaults().wellDrawn(well.name()));
        }
        return add;
    }

    /** {@code add}, stepping the digitizing defaults (next contour value, next well name) when first executed. */
    private static Command steppingDefaults(SheetEditCommand add, Runnable step) {
        return new Command(add.getLabel()) {
            @Override
            public void execute() {
                add.execute();
                step.run();
            }

            @Override
            public void undo() {
                add.undo();
            }

            @Override
            public void redo() {
                add.redo();
            }
        };
    }

    @Override
    protected EditPolicy createChildEditPolicy(EditPart child) {
        if (child instanceof FeatureEditPart feature && feature.isLine()) {
            return new VertexHandlesPolicy();
        }
        return new NonResizableEditPolicy();
    }

    @Override
    protected Command getCreateCommand(CreateRequest request) {
        return null;
    }

    @Override
    protected Command getMoveChildrenCommand(Request request) {
        ChangeBoundsRequest move = (ChangeBoundsRequest) request;
        PrecisionPoint from = sheetPart().toDrawing(new Point(0, 0));
        PrecisionPoint to = sheetPart().toDrawing(move.getMoveDelta());
        double du = to.preciseX - from.preciseX;
        double dv = to.preciseY - from.preciseY;
        ScanProjection projection = sheetPart().projection();
        CompoundCommand moves = new CompoundCommand("Move");
        for (Object part : (List<?>) move.getEditParts()) {
            if (part instanceof FeatureEditPart feature) {
                moves.add(SheetEditCommand.replacing(feature.sheet(), FeatureEdits.moved(feature.feature(), c -> {
                    double[] d = projection.toDrawing(c.x, c.y);
                    double[] m = projection.toMap(d[0] + du, d[1] + dv);
                    return new Coordinate(m[0], m[1]);
                })));
            } else if (part instanceof ControlPointEditPart point) {
                ControlPoint p = point.point();
                moves.add(ControlPointCommand.replacing(point.georeference(), new ControlPoint(p.id(),
                        p.col() + du, p.row() + dv, p.x(), p.y(), p.enabled())));
            }
        }
        return moves.unwrap();
    }
}
