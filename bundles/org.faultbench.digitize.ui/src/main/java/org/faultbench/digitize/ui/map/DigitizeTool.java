package org.faultbench.digitize.ui.map;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.draw2d.Cursors;
import org.eclipse.draw2d.IFigure;
import org.eclipse.draw2d.Polyline;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.PointList;
import org.eclipse.draw2d.geometry.PrecisionPoint;
import org.eclipse.gef.LayerConstants;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editparts.LayerManager;
import org.eclipse.gef.tools.AbstractTool;
import org.eclipse.swt.SWT;
import org.eclipse.swt.events.KeyEvent;
import org.faultbench.digitize.ui.editing.DigitizeKind;
import org.locationtech.jts.geom.Coordinate;

/**
 * Digitizes one kind of feature: each click adds a point, snapped to the existing features; a double-click (or
 * Enter) ends a line, one click makes a point feature or control point; Escape drops the points, Backspace the
 * last one. The tool stays active, so contour after contour can be traced. The finished gesture goes to the sheet as
 * a {@link DigitizeRequest} and comes back as a command.
 */
public final class DigitizeTool extends AbstractTool {
    /** Tool property: the {@link DigitizeKind} this tool draws. */
    public static final String KIND = "digitize kind";
    private static final int SAME_POINT_PIXELS = 3;

    private DigitizeKind kind = DigitizeKind.CONTOUR;
    private final List<Coordinate> mapPoints = new ArrayList<>();
    private final List<Point> screenPoints = new ArrayList<>();
    private final List<double[]> drawingPoints = new ArrayList<>();
    private Polyline feedback;

    public DigitizeTool() {
        setDefaultCursor(Cursors.CROSS);
        setUnloadWhenFinished(false);
    }

    @Override
    protected void applyProperty(Object key, Object value) {
        if (KIND.equals(key) && value instanceof DigitizeKind k) {
            kind = k;
            return;
        }
        super.applyProperty(key, value);
    }

    public DigitizeKind kind() {
        return kind;
    }

    @Override
    protected String getCommandName() {
        return DigitizeRequest.TYPE;
    }

    private SheetEditPart sheetPart() {
        return (SheetEditPart) getCurrentViewer().getContents();
    }

    @Override
    protected boolean handleButtonDown(int button) {
        if (button != 1 || !(getCurrentViewer().getContents() instanceof SheetEditPart)) {
            return false;
        }
        Point screen = getLocation().getCopy();
        if (!screenPoints.isEmpty() && screen.getDistance(screenPoints.get(screenPoints.size() - 1))
                <= SAME_POINT_PIXELS) {
            return true; // second press of a double-click
        }
        PrecisionPoint drawing = sheetPart().toDrawing(screen);
        Coordinate map = kind == DigitizeKind.CONTROL_POINT ? null
                : sheetPart().snapped(drawing.preciseX, drawing.preciseY, null);
        mapPoints.add(map);
        drawingPoints.add(new double[] { drawing.preciseX, drawing.preciseY });
        screenPoints.add(snappedScreen(map, screen));
        if (kind.isPoint()) {
            finish();
        } else {
            showFeedback(screen);
        }
        return true;
    }

    /** Where the snapped point is on screen, so the rubber band shows the snap. */
    private Point snappedScreen(Coordinate map, Point screen) {
        if (map == null) {
            return screen;
        }
        double[] d = sheetPart().projection().toDrawing(map.x, map.y);
        PrecisionPoint p = new PrecisionPoint(d[0], d[1]);
        sheetPart().getFigure().translateToAbsolute(p);
        return new Point(p.x, p.y);
    }

    @Override
    protected boolean handleDoubleClick(int button) {
        if (button == 1 && mapPoints.size() >= kind.minimumPoints()) {
            finish();
        }
        return true;
    }

    @Override
    protected boolean handleMove() {
        if (!screenPoints.isEmpty()) {
            showFeedback(getLocation());
        }
        return true;
    }

    @Override
    protected boolean handleKeyDown(KeyEvent e) {
        if (e.keyCode == SWT.ESC) {
            clear();
            return true;
        }
        if ((e.character == '\r' || e.keyCode == SWT.KEYPAD_CR) && mapPoints.size() >= kind.minimumPoints()) {
            finish();
            return true;
        }
        if (e.character == SWT.BS && !mapPoints.isEmpty()) {
            int last = mapPoints.size() - 1;
            mapPoints.remove(last);
            drawingPoints.remove(last);
            screenPoints.remove(last);
            showFeedback(getLocation());
            return true;
        }
        return super.handleKeyDown(e);
    }

    private void finish() {
        if (mapPoints.size() >= kind.minimumPoints()) {
            DigitizeRequest request = new DigitizeRequest(kind, kind == DigitizeKind.CONTROL_POINT ? List.of()
                    : mapPoints, drawingPoints.get(0));
            Command command = sheetPart().getCommand(request);
            if (command != null && command.canExecute()) {
                executeCommand(command);
            }
        }
        clear();
    }

    private void clear() {
        mapPoints.clear();
        drawingPoints.clear();
        screenPoints.clear();
        if (feedback != null) {
            removeFeedback(feedback);
            feedback = null;
        }
    }

    private void showFeedback(Point pointer) {
        if (screenPoints.isEmpty()) {
            clear();
            return;
        }
        if (feedback == null) {
            feedback = new Polyline();
            feedback.setForegroundColor(MapColours.FEEDBACK);
            feedback.setLineWidth(2);
            addFeedback(feedback);
        }
        PointList points = new PointList();
        screenPoints.forEach(points::addPoint);
        points.addPoint(pointer);
        IFigure layer = LayerManager.Helper.find(getCurrentViewer().getContents())
                .getLayer(LayerConstants.FEEDBACK_LAYER);
        layer.translateToRelative(points);
        feedback.setPoints(points);
    }

    @Override
    public void deactivate() {
        clear();
        super.deactivate();
    }

    /** Points clicked so far in the current gesture. */
    public int pendingPoints() {
        return mapPoints.size();
    }
}
