package org.faultbench.juxtaposition;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.Wall;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.PolygonExtracter;

/**
 * Drawable Allan diagram (Allan 1989) of one fault: every unit of each wall as a polygon on the unrolled fault plane
 * (x = along-strike distance u, y = depth z, positive down) and the reservoir/reservoir windows where footwall and
 * hanging-wall reservoir polygons overlap. Polygons pass through the column centres and run flat over the outer half
 * columns, so they span the same length as the columns; columns without data split a polygon into parts.
 */
public final class AllanDiagram {

    private final FaultPlaneColumns columns;
    private final HungColumns walls;
    private final Geometry[] footwallUnits;
    private final Geometry[] hangingWallUnits;
    private final List<AllanWindow> reservoirWindows;

    private AllanDiagram(FaultPlaneColumns columns, HungColumns walls, GeometryFactory factory) {
        this.columns = columns;
        this.walls = walls;
        this.footwallUnits = outlines(Wall.FOOTWALL, factory);
        this.hangingWallUnits = outlines(Wall.HANGING_WALL, factory);
        this.reservoirWindows = windows(factory);
    }

    /** Allan diagram of {@code walls} hung along {@code columns}. */
    public static AllanDiagram of(FaultPlaneColumns columns, HungColumns walls) {
        return new AllanDiagram(columns, walls, new GeometryFactory());
    }

    public FaultPlaneColumns columns() {
        return columns;
    }

    public HungColumns walls() {
        return walls;
    }

    /** Outline of unit {@code unit} (0..size()-1) of {@code wall}; empty for a unit of zero thickness. */
    public Geometry unitOutline(Wall wall, int unit) {
        Geometry[] outlines = wall == Wall.FOOTWALL ? footwallUnits : hangingWallUnits;
        if (unit < 0 || unit >= outlines.length) {
            throw new IllegalArgumentException((wall == Wall.FOOTWALL ? "footwall" : "hanging-wall") + " unit index must be in [0, "
                    + (outlines.length - 1) + "], was " + unit);
        }
        return outlines[unit].copy();
    }

    /** Reservoir/reservoir windows, one per overlapping (footwall reservoir, hanging-wall reservoir) pair. */
    public List<AllanWindow> reservoirWindows() {
        return reservoirWindows;
    }

    private Geometry[] outlines(Wall wall, GeometryFactory factory) {
        HungColumn column = walls.wall(wall);
        Geometry[] outlines = new Geometry[column.size()];
        for (int unit = 0; unit < column.size(); unit++) {
            outlines[unit] = outline(wall, column.topBelowReference(unit), column.topBelowReference(unit + 1), factory);
        }
        return outlines;
    }

    private Geometry outline(Wall wall, double top, double base, GeometryFactory factory) {
        List<Polygon> parts = new ArrayList<>();
        if (base > top) {
            int k = 0;
            while (k < columns.count()) {
                if (!columns.hasData(k)) {
                    k++;
                    continue;
                }
                int first = k;
                while (k < columns.count() && columns.hasData(k)) {
                    k++;
                }
                parts.add(strip(wall, first, k - 1, top, base, factory));
            }
        }
        return factory.buildGeometry(parts);
    }

    /** Polygon between the top and base of a unit over columns first..last: top left to right, base back. */
    private Polygon strip(Wall wall, int first, int last, double top, double base, GeometryFactory factory) {
        int n = last - first + 1;
        Coordinate[] ring = new Coordinate[2 * (n + 2) + 1];
        double halfWidth = columns.width() / 2;
        ring[0] = new Coordinate(columns.u(first) - halfWidth, cutOff(wall, first) + top);
        ring[n + 1] = new Coordinate(columns.u(last) + halfWidth, cutOff(wall, last) + top);
        ring[n + 2] = new Coordinate(columns.u(last) + halfWidth, cutOff(wall, last) + base);
        ring[2 * n + 3] = new Coordinate(columns.u(first) - halfWidth, cutOff(wall, first) + base);
        for (int i = 0; i < n; i++) {
            int k = first + i;
            ring[1 + i] = new Coordinate(columns.u(k), cutOff(wall, k) + top);
            ring[2 * n + 2 - i] = new Coordinate(columns.u(k), cutOff(wall, k) + base);
        }
        ring[ring.length - 1] = ring[0].copy();
        return factory.createPolygon(ring);
    }

    private double cutOff(Wall wall, int column) {
        return wall == Wall.FOOTWALL ? columns.footwallDepth(column) : columns.hangingWallDepth(column);
    }

    private List<AllanWindow> windows(GeometryFactory factory) {
        List<AllanWindow> windows = new ArrayList<>();
        for (int i = 0; i < footwallUnits.length; i++) {
            for (int j = 0; j < hangingWallUnits.length; j++) {
                if (walls.footwall().isReservoir(i) && walls.hangingWall().isReservoir(j)) {
                    List<Polygon> overlap = areal(footwallUnits[i].intersection(hangingWallUnits[j]));
                    if (!overlap.isEmpty()) {
                        windows.add(new AllanWindow(i, j, factory.buildGeometry(overlap)));
                    }
                }
            }
        }
        return List.copyOf(windows);
    }

    /** Polygons of positive area in an overlay result, which may also hold empty or collapsed parts. */
    private static List<Polygon> areal(Geometry overlay) {
        List<Polygon> polygons = new ArrayList<>();
        for (Object part : PolygonExtracter.getPolygons(overlay)) {
            Polygon polygon = (Polygon) part;
            if (polygon.getArea() > 0) {
                polygons.add(polygon);
            }
        }
        return polygons;
    }
}
