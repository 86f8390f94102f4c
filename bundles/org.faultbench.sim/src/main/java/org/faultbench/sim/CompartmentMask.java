package org.faultbench.sim;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygon;

/** The grid nodes inside a compartment outline (JTS point-in-polygon, boundary included). */
final class CompartmentMask {

    private CompartmentMask() {
    }

    static GridMask of(GridGeometry geometry, Polygon outline) {
        IndexedPointInAreaLocator locator = new IndexedPointInAreaLocator(outline);
        boolean[] inside = new boolean[geometry.size()];
        Coordinate c = new Coordinate();
        for (int k = 0; k < inside.length; k++) {
            c.x = geometry.x(geometry.column(k));
            c.y = geometry.y(geometry.row(k));
            inside[k] = locator.locate(c) != Location.EXTERIOR;
        }
        return GridMask.of(geometry, inside);
    }

    static GridMask and(GridMask a, GridMask b) {
        boolean[] both = new boolean[a.geometry().size()];
        for (int k = 0; k < both.length; k++) {
            both[k] = a.contains(k) && b.contains(k);
        }
        return GridMask.of(a.geometry(), both);
    }
}
