package org.faultbench.digitize.ui.editing;

import java.util.Arrays;
import java.util.List;
import java.util.function.UnaryOperator;

import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.sketch.WellFeature;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * Builds the new value of a feature for each editor gesture (draw, move a vertex, drag, change an attribute), so the
 * commands only swap values on the sheet. Features are immutable records; every method returns a new one with the
 * same id.
 */
public final class FeatureEdits {
    private static final GeometryFactory FACTORY = new GeometryFactory();

    private FeatureEdits() {
    }

    /**
     * The feature drawn with a digitizing tool.
     *
     * @param points clicked map positions after snapping; a fault polygon is closed back to its first point
     */
    public static SheetFeature create(DigitizeKind kind, FeatureId id, List<Coordinate> points,
            DigitizingDefaults defaults) {
        if (points.size() < kind.minimumPoints()) {
            throw new IllegalArgumentException(kind.label() + " needs at least " + kind.minimumPoints()
                    + " points, was " + points.size());
        }
        return switch (kind) {
            case CONTOUR -> new ContourFeature(id, defaults.horizon(), defaults.nextContourValue(), line(points));
            case FAULT_TRACE -> new FaultTraceFeature(id, defaults.fault(), line(points), defaults.hangingWallSide());
            case FAULT_POLYGON -> new FaultPolygonFeature(id, defaults.fault(), defaults.horizon(), closed(points));
            case FOOTWALL_CUT_OFF -> new CutOffFeature(id, defaults.fault(), defaults.horizon(), Wall.FOOTWALL,
                    line(points));
            case HANGING_WALL_CUT_OFF -> new CutOffFeature(id, defaults.fault(), defaults.horizon(),
                    Wall.HANGING_WALL, line(points));
            case MARKER -> new MarkerFeature(id, defaults.markerKind(), points.get(0).x, points.get(0).y,
                    defaults.horizon(), "");
            case WELL -> new WellFeature(id, defaults.wellName(), points.get(0).x, points.get(0).y, List.of());
            case CONTROL_POINT -> throw new IllegalArgumentException("a control point is not a sheet feature");
        };
    }

    /** The vertices of a line feature, or the single position of a point feature. */
    public static Coordinate[] vertices(SheetFeature feature) {
        return feature.geometry().getCoordinates();
    }

    /** {@code feature} with vertex {@code index} moved to (x, y); a closed outline keeps its ends together. */
    public static SheetFeature withVertex(SheetFeature feature, int index, double x, double y) {
        Coordinate[] points = vertices(feature);
        if (index < 0 || index >= points.length) {
            throw new IllegalArgumentException(feature.describe() + " has vertices 0 to " + (points.length - 1)
                    + ", not " + index);
        }
        Coordinate[] moved = Arrays.stream(points).map(Coordinate::copy).toArray(Coordinate[]::new);
        boolean closed = points.length > 2 && points[0].equals2D(points[points.length - 1]);
        moved[index] = new Coordinate(x, y);
        if (closed && (index == 0 || index == points.length - 1)) {
            moved[0] = new Coordinate(x, y);
            moved[points.length - 1] = new Coordinate(x, y);
        }
        return withGeometry(feature, moved);
    }

    /** {@code feature} with every vertex mapped by {@code move}, e.g. a drag across the drawing. */
    public static SheetFeature moved(SheetFeature feature, UnaryOperator<Coordinate> move) {
        return withGeometry(feature, Arrays.stream(vertices(feature)).map(move).toArray(Coordinate[]::new));
    }

    private static SheetFeature withGeometry(SheetFeature feature, Coordinate[] points) {
        if (feature instanceof ContourFeature c) {
            return new ContourFeature(c.id(), c.horizon(), c.depth(), FACTORY.createLineString(points));
        } else if (feature instanceof FaultTraceFeature t) {
            return new FaultTraceFeature(t.id(), t.fault(), FACTORY.createLineString(points), t.hangingWallSide());
        } else if (feature instanceof FaultPolygonFeature p) {
            return new FaultPolygonFeature(p.id(), p.fault(), p.horizon(), FACTORY.createLineString(points));
        } else if (feature instanceof CutOffFeature c) {
            return new CutOffFeature(c.id(), c.fault(), c.horizon(), c.wall(), FACTORY.createLineString(points));
        } else if (feature instanceof MarkerFeature m) {
            return new MarkerFeature(m.id(), m.kind(), points[0].x, points[0].y, m.horizon(), m.note());
        }
        WellFeature w = (WellFeature) feature;
        return new WellFeature(w.id(), w.name(), points[0].x, points[0].y, w.tops());
    }

    private static LineString line(List<Coordinate> points) {
        return FACTORY.createLineString(points.stream().map(Coordinate::copy).toArray(Coordinate[]::new));
    }

    private static LineString closed(List<Coordinate> points) {
        Coordinate first = points.get(0);
        Coordinate last = points.get(points.size() - 1);
        if (first.equals2D(last)) {
            return line(points);
        }
        Coordinate[] ring = new Coordinate[points.size() + 1];
        for (int i = 0; i < points.size(); i++) {
            ring[i] = points.get(i).copy();
        }
        ring[points.size()] = first.copy();
        return FACTORY.createLineString(ring);
    }
}
