package org.faultbench.digitize.gridding;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.digitize.io.XyzPoint;
import org.locationtech.jts.densify.Densifier;
import org.locationtech.jts.geom.Coordinate;

/**
 * What a horizon is gridded from: scattered control points, depth contours, the faults it may not be interpolated
 * across and the grid to fill. All in metres, depth positive downward.
 *
 * @param points scattered control points (x, y, depth)
 * @param contours depth contours
 * @param barriers fault traces and fault polygons
 * @param target nodes to compute
 */
public record GriddingInput(List<XyzPoint> points, List<ContourLine> contours, FaultBarriers barriers,
        GridGeometry target) {

    public GriddingInput {
        if (points == null || contours == null || barriers == null || target == null) {
            throw new IllegalArgumentException("gridding input incomplete: points " + (points != null) + ", contours "
                    + (contours != null) + ", fault barriers " + (barriers != null) + ", target grid "
                    + (target != null));
        }
        points = List.copyOf(points);
        contours = List.copyOf(contours);
        if (points.isEmpty() && contours.isEmpty()) {
            throw new IllegalArgumentException("nothing to grid: no control points and no contours");
        }
    }

    /**
     * The control points followed by every digitised contour vertex, each with a label a geologist can find again
     * ("point 3", "contour 2 (1500 m), vertex 5"), for residual reports.
     */
    public List<LabelledPoint> digitizedPoints() {
        List<LabelledPoint> labelled = new ArrayList<>();
        for (int k = 0; k < points.size(); k++) {
            XyzPoint p = points.get(k);
            labelled.add(new LabelledPoint("point " + (k + 1), p.x(), p.y(), p.z()));
        }
        for (int c = 0; c < contours.size(); c++) {
            ContourLine contour = contours.get(c);
            Coordinate[] vertices = contour.line().getCoordinates();
            for (int v = 0; v < vertices.length; v++) {
                String label = String.format(Locale.ROOT, "contour %d (%s m), vertex %d", c + 1, contour.z(), v + 1);
                labelled.add(new LabelledPoint(label, vertices[v].x, vertices[v].y, contour.z()));
            }
        }
        return labelled;
    }

    /** Control points plus points along every contour no further apart than {@code spacing} metres. */
    List<XyzPoint> pointsWithContourSamples(double spacing) {
        List<XyzPoint> all = new ArrayList<>(points);
        for (ContourLine contour : contours) {
            for (Coordinate c : Densifier.densify(contour.line(), spacing).getCoordinates()) {
                all.add(new XyzPoint(c.x, c.y, contour.z()));
            }
        }
        return all;
    }
}
