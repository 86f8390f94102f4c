package org.faultbench.digitize.ui.map;

import java.util.List;

import org.eclipse.gef.Request;
import org.faultbench.digitize.ui.editing.DigitizeKind;
import org.locationtech.jts.geom.Coordinate;

/** A finished digitizing gesture sent to the sheet: what was drawn and its map points after snapping. */
public final class DigitizeRequest extends Request {
    public static final String TYPE = "faultbench digitize";

    private final DigitizeKind kind;
    private final List<Coordinate> mapPoints;
    private final double[] drawing;

    /**
     * @param drawing drawing position {u, v} of the first click (where a control point is picked)
     */
    public DigitizeRequest(DigitizeKind kind, List<Coordinate> mapPoints, double[] drawing) {
        super(TYPE);
        this.kind = kind;
        this.mapPoints = List.copyOf(mapPoints);
        this.drawing = drawing.clone();
    }

    public DigitizeKind kind() {
        return kind;
    }

    public List<Coordinate> mapPoints() {
        return mapPoints;
    }

    public double[] firstDrawingPoint() {
        return drawing.clone();
    }
}
