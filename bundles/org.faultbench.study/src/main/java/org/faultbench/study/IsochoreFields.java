package org.faultbench.study;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.strat.Isochore;
import org.faultbench.strat.IsochoreThickness;
import org.faultbench.strat.Stratigraphy;
import org.locationtech.jts.densify.Densifier;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * Unit thicknesses given as isochore grids: {@code "thickness": {"isochore": "grids/x.asc", "scale": <uncertain>}}
 * (optional {@code format} and {@code unit} as for the reference top; scale 1 when left out). Each grid is checked at
 * load: no negative thickness, and a value wherever the study will ask for one (every reference-top node in the
 * compartment and its outline, along which the bounding faults run).
 */
final class IsochoreFields {

    private IsochoreFields() {
    }

    static boolean isIsochore(JsonNode thickness) throws StudyFormatException {
        return thickness.element().isJsonObject() && thickness.has("isochore");
    }

    /** The stratigraphy with its isochore units bound to their grids; {@code layerCake} itself when there are none. */
    static Stratigraphy read(JsonNode stratigraphy, Stratigraphy layerCake, Path folder, RegularGrid referenceTop,
            Polygon compartment) throws StudyFormatException {
        Map<String, Isochore> isochores = new LinkedHashMap<>();
        List<JsonNode> units = stratigraphy.field("units").array();
        for (JsonNode unit : units) {
            JsonNode thickness = unit.field("thickness");
            if (!isIsochore(thickness)) {
                continue;
            }
            RegularGrid grid = AnalysisFileReader.readGrid(thickness, "isochore", folder);
            JsonNode file = thickness.field("isochore");
            requireNonNegative(grid, file);
            UncertainValue scale = thickness.has("scale") ? UncertainValueFormat.read(thickness.field("scale"))
                    : UncertainValue.fixed(1);
            String source = file.string();
            Isochore isochore = UncertainValueFormat.wrap(thickness.has("scale") ? thickness.field("scale") : thickness,
                    () -> new Isochore(source, grid, scale));
            requireCoverage(isochore, referenceTop, compartment, file);
            isochores.put(unit.field("name").string(), isochore);
        }
        return isochores.isEmpty() ? layerCake : layerCake.withThicknessModel(new IsochoreThickness(isochores));
    }

    private static void requireNonNegative(RegularGrid grid, JsonNode file) throws StudyFormatException {
        GridGeometry g = grid.geometry();
        for (int k = 0; k < g.size(); k++) {
            if (!grid.isNull(k) && grid.value(k) < 0) {
                throw file.error("isochore " + file.string() + " has a negative thickness " + grid.value(k)
                        + " m at column " + (g.column(k) + 1) + ", row " + (g.row(k) + 1) + " (x " + g.x(g.column(k))
                        + ", y " + g.y(g.row(k)) + ")");
            }
        }
    }

    private static void requireCoverage(Isochore isochore, RegularGrid referenceTop, Polygon compartment,
            JsonNode file) throws StudyFormatException {
        GridGeometry g = referenceTop.geometry();
        PreparedGeometry inside = PreparedGeometryFactory.prepare(compartment);
        for (int k = 0; k < g.size(); k++) {
            double x = g.x(g.column(k));
            double y = g.y(g.row(k));
            if (inside.contains(compartment.getFactory().createPoint(new Coordinate(x, y)))) {
                requireValue(isochore, x, y, file);
            }
        }
        for (Coordinate c : Densifier.densify(compartment.getExteriorRing(), Math.min(g.dx(), g.dy())).getCoordinates()) {
            requireValue(isochore, c.x, c.y, file);
        }
    }

    private static void requireValue(Isochore isochore, double x, double y, JsonNode file)
            throws StudyFormatException {
        if (Double.isNaN(isochore.gridThicknessAt(x, y))) {
            throw file.error("isochore " + file.string() + " does not cover the compartment: no value at x " + x
                    + ", y " + y + " (outside the grid or next to a null node)");
        }
    }
}
