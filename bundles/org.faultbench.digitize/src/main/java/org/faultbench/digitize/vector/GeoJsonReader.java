package org.faultbench.digitize.vector;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;

/**
 * Reads line and polygon features from GeoJSON (IETF RFC 7946): a FeatureCollection or a single Feature whose
 * geometry is a LineString, MultiLineString or Polygon; positions of 2 or 3 numbers (x, y[, z]); polygon rings
 * closed, with at least 4 positions (RFC 7946 &sect;3.1.6). Properties may be text, numbers or true/false; null
 * properties are left out.
 * <p>
 * Coordinates: RFC 7946 assumes WGS 84 longitude/latitude, but Faultbench works in projected map coordinates, so
 * its files carry a "crs" note in each feature's properties ({@link GeoJsonWriter}); that note is read as an
 * ordinary property. x, y are converted from {@link FileUnits#xy()}, z from {@link FileUnits#z()} to metres.
 * Syntax errors (from gson) and content errors name the line and column; nothing is returned from a file that fails.
 */
public final class GeoJsonReader {
    private static final GeometryFactory FACTORY = new GeometryFactory();

    private final FileUnits units;

    public GeoJsonReader(FileUnits units) {
        if (units == null) {
            throw new IllegalArgumentException("file units missing");
        }
        this.units = units;
    }

    public List<VectorFeature> read(Path file) throws IOException {
        Path name = file.getFileName();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in, name == null ? file.toString() : name.toString());
        }
    }

    /** Reads from {@code in}; {@code sourceName} names the source in error messages. */
    public List<VectorFeature> read(Reader in, String sourceName) throws IOException {
        JsonNode root = JsonNode.parse(in, sourceName);
        Map<String, JsonNode> members = root.members(sourceName, "the GeoJSON document");
        String type = member(sourceName, root, members, "type").text(sourceName, "'type'");
        List<VectorFeature> features = new ArrayList<>();
        switch (type) {
            case "FeatureCollection" -> {
                JsonNode list = member(sourceName, root, members, "features");
                for (JsonNode feature : list.elements(sourceName, "'features'")) {
                    features.add(feature(sourceName, feature));
                }
            }
            case "Feature" -> features.add(feature(sourceName, root));
            default -> throw JsonNode.error(sourceName, members.get("type"), "expected a FeatureCollection or a "
                    + "Feature, found type '" + type + "'");
        }
        return List.copyOf(features);
    }

    private static JsonNode member(String fileName, JsonNode object, Map<String, JsonNode> members, String name)
            throws FormatException {
        JsonNode member = members.get(name);
        if (member == null) {
            throw JsonNode.error(fileName, object, "member '" + name + "' is missing");
        }
        return member;
    }

    private VectorFeature feature(String fileName, JsonNode node) throws FormatException {
        Map<String, JsonNode> members = node.members(fileName, "a feature");
        String type = member(fileName, node, members, "type").text(fileName, "'type'");
        if (!type.equals("Feature")) {
            throw JsonNode.error(fileName, members.get("type"), "expected type 'Feature', found '" + type + "'");
        }
        JsonNode geometry = member(fileName, node, members, "geometry");
        if (geometry.value() == null) {
            throw JsonNode.error(fileName, geometry, "feature without geometry; only lines and polygons are read");
        }
        JsonNode properties = members.get("properties");
        Geometry shape = geometry(fileName, geometry);
        Map<String, Object> values = properties == null || properties.value() == null ? Map.of()
                : properties(fileName, properties);
        try {
            return new VectorFeature(shape, values);
        } catch (IllegalArgumentException refused) {
            // e.g. "coordinates": [] gives an empty geometry, which a feature may not have
            throw JsonNode.error(fileName, geometry, refused.getMessage());
        }
    }

    private Geometry geometry(String fileName, JsonNode node) throws FormatException {
        Map<String, JsonNode> members = node.members(fileName, "'geometry'");
        JsonNode typeNode = member(fileName, node, members, "type");
        String type = typeNode.text(fileName, "geometry 'type'");
        if (!FeatureGeometry.SUPPORTED.contains(type)) {
            throw JsonNode.error(fileName, typeNode, FeatureGeometry.unsupported(type));
        }
        JsonNode coordinates = member(fileName, node, members, "coordinates");
        return switch (type) {
            case Geometry.TYPENAME_LINESTRING -> line(fileName, coordinates);
            case Geometry.TYPENAME_MULTILINESTRING -> {
                List<LineString> lines = new ArrayList<>();
                for (JsonNode part : coordinates.elements(fileName, "MultiLineString coordinates")) {
                    lines.add(line(fileName, part));
                }
                yield FACTORY.createMultiLineString(lines.toArray(LineString[]::new));
            }
            default -> polygon(fileName, coordinates);
        };
    }

    private LineString line(String fileName, JsonNode node) throws FormatException {
        Coordinate[] points = positions(fileName, node, "a line");
        if (points.length < 2) {
            throw JsonNode.error(fileName, node, "a line needs at least 2 positions, found " + points.length);
        }
        return FACTORY.createLineString(points);
    }

    private Geometry polygon(String fileName, JsonNode node) throws FormatException {
        List<JsonNode> ringNodes = node.elements(fileName, "Polygon coordinates");
        if (ringNodes.isEmpty()) {
            throw JsonNode.error(fileName, node, "a polygon needs an outer ring");
        }
        List<LinearRing> rings = new ArrayList<>();
        for (JsonNode ringNode : ringNodes) {
            Coordinate[] points = positions(fileName, ringNode, "a polygon ring");
            if (points.length < 4 || !points[0].equals2D(points[points.length - 1])) {
                throw JsonNode.error(fileName, ringNode, "a polygon ring needs at least 4 positions and must end "
                        + "where it starts (RFC 7946, 3.1.6)");
            }
            rings.add(FACTORY.createLinearRing(points));
        }
        return FACTORY.createPolygon(rings.get(0), rings.subList(1, rings.size()).toArray(LinearRing[]::new));
    }

    private Coordinate[] positions(String fileName, JsonNode node, String what) throws FormatException {
        List<JsonNode> elements = node.elements(fileName, "the positions of " + what);
        Coordinate[] points = new Coordinate[elements.size()];
        for (int k = 0; k < points.length; k++) {
            points[k] = position(fileName, elements.get(k));
        }
        return points;
    }

    private Coordinate position(String fileName, JsonNode node) throws FormatException {
        List<JsonNode> numbers = node.elements(fileName, "a position");
        if (numbers.size() < 2 || numbers.size() > 3) {
            throw JsonNode.error(fileName, node, "a position needs 2 or 3 numbers (x, y[, z]), found "
                    + numbers.size());
        }
        double x = units.xy().toMetres(numbers.get(0).number(fileName, "x"));
        double y = units.xy().toMetres(numbers.get(1).number(fileName, "y"));
        double z = numbers.size() == 3 ? units.z().toMetres(numbers.get(2).number(fileName, "z")) : Double.NaN;
        return new Coordinate(x, y, z);
    }

    private static Map<String, Object> properties(String fileName, JsonNode node) throws FormatException {
        Map<String, Object> properties = new LinkedHashMap<>();
        for (Map.Entry<String, JsonNode> member : node.members(fileName, "'properties'").entrySet()) {
            Object value = member.getValue().value();
            if (member.getKey().isBlank()) {
                throw JsonNode.error(fileName, member.getValue(), "a property has an empty name");
            }
            if (value instanceof Map || value instanceof List) {
                throw JsonNode.error(fileName, member.getValue(), "property '" + member.getKey() + "' is an object "
                        + "or array; only text, numbers and true/false are read");
            }
            if (value != null) {
                properties.put(member.getKey(), value);
            }
        }
        return properties;
    }
}
