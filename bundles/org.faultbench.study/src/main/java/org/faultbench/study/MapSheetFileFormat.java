package org.faultbench.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.TraceSide;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.sketch.WellFeature;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * Reads and writes map-sheet files (format {@value #FORMAT}, schema version {@value #SCHEMA_VERSION}, described in
 * DEVELOPERS.md). Features keep their ids and their drawing order. Coordinates are map coordinates in the
 * project's CRS; depths in metres TVDSS.
 */
public final class MapSheetFileFormat {
    public static final String FORMAT = "faultbench-mapsheet";
    public static final int SCHEMA_VERSION = 1;
    static final MigrationChain CHAIN = new MigrationChain("schemaVersion", SCHEMA_VERSION, List.of());
    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    public byte[] write(MapSheetFile file) {
        JsonObject doc = new JsonObject();
        doc.addProperty("format", FORMAT);
        doc.addProperty("schemaVersion", SCHEMA_VERSION);
        file.image().ifPresent(image -> doc.addProperty("image", image));
        JsonObject georeference = new JsonObject();
        georeference.addProperty("transform", file.transform().name().toLowerCase(java.util.Locale.ROOT));
        JsonArray points = new JsonArray();
        for (ControlPoint p : file.controlPoints()) {
            JsonObject o = new JsonObject();
            o.addProperty("id", p.id());
            o.addProperty("col", p.col());
            o.addProperty("row", p.row());
            o.addProperty("x", p.x());
            o.addProperty("y", p.y());
            o.addProperty("enabled", p.enabled());
            points.add(o);
        }
        georeference.add("controlPoints", points);
        doc.add("georeference", georeference);
        JsonArray features = new JsonArray();
        for (SheetFeature feature : file.sheet().features()) {
            features.add(feature(feature));
        }
        doc.add("features", features);
        return StudyJson.pretty(doc);
    }

    public MapSheetFile read(byte[] content, String fileName) throws StudyFormatException {
        JsonNode doc = new JsonNode(fileName, "", CHAIN.migrate(StudyJson.parse(content, fileName), fileName));
        StudyJson.checkHeader(doc, FORMAT, "schemaVersion", SCHEMA_VERSION);
        Optional<String> image = doc.has("image") ? Optional.of(StudyJson.relativePath(doc.field("image")))
                : Optional.empty();
        JsonNode georeference = doc.field("georeference");
        TransformKind transform = transformKind(georeference.field("transform"));
        List<ControlPoint> points = new ArrayList<>();
        for (JsonNode p : georeference.field("controlPoints").array()) {
            String id = p.field("id").string();
            double col = p.field("col").number();
            double row = p.field("row").number();
            double x = p.field("x").number();
            double y = p.field("y").number();
            boolean enabled = !p.has("enabled") || p.field("enabled").bool();
            points.add(valid(p, () -> new ControlPoint(id, col, row, x, y, enabled)));
        }
        MapSheet sheet = new MapSheet();
        for (JsonNode f : doc.field("features").array()) {
            SheetFeature feature = feature(f);
            if (sheet.find(feature.id()).isPresent()) {
                throw f.field("id").error("feature id " + feature.id().value() + " is used twice");
            }
            sheet.add(feature);
        }
        return new MapSheetFile(image, transform, points, sheet);
    }

    private static JsonObject feature(SheetFeature feature) {
        JsonObject o = new JsonObject();
        if (feature instanceof ContourFeature c) {
            o.addProperty("type", "contour");
            o.addProperty("id", c.id().value());
            o.addProperty("horizon", c.horizon());
            o.addProperty("depth", c.depth());
            o.add("line", line(c.line()));
        } else if (feature instanceof FaultTraceFeature t) {
            o.addProperty("type", "faultTrace");
            o.addProperty("id", t.id().value());
            o.addProperty("fault", t.fault());
            o.addProperty("hangingWallSide", t.hangingWallSide() == TraceSide.LEFT ? "left" : "right");
            o.add("line", line(t.trace()));
        } else if (feature instanceof FaultPolygonFeature p) {
            o.addProperty("type", "faultPolygon");
            o.addProperty("id", p.id().value());
            o.addProperty("fault", p.fault());
            o.addProperty("horizon", p.horizon());
            o.add("line", line(p.outline()));
        } else if (feature instanceof CutOffFeature c) {
            o.addProperty("type", "cutOff");
            o.addProperty("id", c.id().value());
            o.addProperty("fault", c.fault());
            o.addProperty("horizon", c.horizon());
            o.addProperty("wall", c.wall() == Wall.FOOTWALL ? "footwall" : "hangingWall");
            o.add("line", line(c.line()));
        } else if (feature instanceof MarkerFeature m) {
            o.addProperty("type", "marker");
            o.addProperty("id", m.id().value());
            o.addProperty("kind", m.kind().name().toLowerCase(java.util.Locale.ROOT));
            o.addProperty("horizon", m.horizon());
            o.addProperty("x", m.x());
            o.addProperty("y", m.y());
            o.addProperty("note", m.note());
        } else if (feature instanceof WellFeature w) {
            o.addProperty("type", "well");
            o.addProperty("id", w.id().value());
            o.addProperty("name", w.name());
            o.addProperty("x", w.x());
            o.addProperty("y", w.y());
            JsonArray tops = new JsonArray();
            for (WellTop top : w.tops()) {
                JsonObject t = new JsonObject();
                t.addProperty("surface", top.surface());
                t.addProperty("x", top.x());
                t.addProperty("y", top.y());
                t.addProperty("tvdss", top.tvdss());
                if (!Double.isNaN(top.md())) {
                    t.addProperty("md", top.md());
                }
                tops.add(t);
            }
            o.add("tops", tops);
        }
        return o;
    }

    private static JsonArray line(LineString line) {
        JsonArray points = new JsonArray();
        for (Coordinate c : line.getCoordinates()) {
            JsonArray p = new JsonArray();
            p.add(c.x);
            p.add(c.y);
            points.add(p);
        }
        return points;
    }

    private static SheetFeature feature(JsonNode f) throws StudyFormatException {
        String type = f.field("type").string();
        long idValue = f.field("id").longInteger();
        if (idValue < 1) {
            throw f.field("id").error("expected a feature id of 1 or more, found " + idValue);
        }
        FeatureId id = new FeatureId(idValue);
        return switch (type) {
            case "contour" -> {
                String horizon = f.field("horizon").string();
                double depth = f.field("depth").number();
                LineString line = line(f.field("line"));
                yield valid(f, () -> new ContourFeature(id, horizon, depth, line));
            }
            case "faultTrace" -> {
                String fault = f.field("fault").string();
                TraceSide side = choice(f.field("hangingWallSide"), "left", "right") == 0 ? TraceSide.LEFT
                        : TraceSide.RIGHT;
                LineString line = line(f.field("line"));
                yield valid(f, () -> new FaultTraceFeature(id, fault, line, side));
            }
            case "faultPolygon" -> {
                String fault = f.field("fault").string();
                String horizon = f.field("horizon").string();
                LineString line = line(f.field("line"));
                yield valid(f, () -> new FaultPolygonFeature(id, fault, horizon, line));
            }
            case "cutOff" -> {
                String fault = f.field("fault").string();
                String horizon = f.field("horizon").string();
                Wall wall = choice(f.field("wall"), "footwall", "hangingWall") == 0 ? Wall.FOOTWALL
                        : Wall.HANGING_WALL;
                LineString line = line(f.field("line"));
                yield valid(f, () -> new CutOffFeature(id, fault, horizon, wall, line));
            }
            case "marker" -> {
                MarkerKind kind = MarkerKind.values()[choice(f.field("kind"), "crest", "spill", "leak")];
                String horizon = f.field("horizon").string();
                double x = f.field("x").number();
                double y = f.field("y").number();
                String note = f.has("note") ? f.field("note").string() : "";
                yield valid(f, () -> new MarkerFeature(id, kind, x, y, horizon, note));
            }
            case "well" -> {
                String name = f.field("name").string();
                double x = f.field("x").number();
                double y = f.field("y").number();
                List<WellTop> tops = new ArrayList<>();
                for (JsonNode t : f.field("tops").array()) {
                    String surface = t.field("surface").string();
                    double tx = t.field("x").number();
                    double ty = t.field("y").number();
                    double tvdss = t.field("tvdss").number();
                    double md = t.has("md") ? t.field("md").number() : Double.NaN;
                    tops.add(valid(t, () -> new WellTop(name, surface, tx, ty, tvdss, md)));
                }
                yield valid(f, () -> new WellFeature(id, name, x, y, tops));
            }
            default -> throw f.field("type").error("expected contour, faultTrace, faultPolygon, cutOff, marker or"
                    + " well, found \"" + type + "\"");
        };
    }

    private static LineString line(JsonNode node) throws StudyFormatException {
        List<JsonNode> items = node.array();
        Coordinate[] points = new Coordinate[items.size()];
        for (int i = 0; i < points.length; i++) {
            double[] xy = items.get(i).numbers(2);
            points[i] = new Coordinate(xy[0], xy[1]);
        }
        if (points.length < 2) {
            throw node.error("a line needs at least 2 points, found " + points.length);
        }
        return GEOMETRY.createLineString(points);
    }

    private static int choice(JsonNode node, String... allowed) throws StudyFormatException {
        String value = node.string();
        for (int i = 0; i < allowed.length; i++) {
            if (allowed[i].equals(value)) {
                return i;
            }
        }
        throw node.error("expected one of " + String.join(", ", allowed) + ", found \"" + value + "\"");
    }

    private static TransformKind transformKind(JsonNode node) throws StudyFormatException {
        String value = node.string();
        for (TransformKind kind : TransformKind.values()) {
            if (kind.name().toLowerCase(java.util.Locale.ROOT).equals(value)) {
                return kind;
            }
        }
        throw node.error("expected similarity, affine, polynomial_2 or projective, found \"" + value + "\"");
    }

    /** A value built by a constructor that checks its arguments; its complaint is reported at {@code node}. */
    private static <T> T valid(JsonNode node, java.util.function.Supplier<T> build) throws StudyFormatException {
        try {
            return build.get();
        } catch (IllegalArgumentException e) {
            throw node.error(e.getMessage(), e);
        }
    }

}
