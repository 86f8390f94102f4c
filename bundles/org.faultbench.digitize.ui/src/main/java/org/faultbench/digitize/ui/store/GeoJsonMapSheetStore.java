package org.faultbench.digitize.ui.store;

import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Properties;

import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.SheetVectorExport;
import org.faultbench.digitize.sketch.TraceSide;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.vector.GeoJsonReader;
import org.faultbench.digitize.vector.GeoJsonWriter;
import org.faultbench.digitize.vector.VectorFeature;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * Stand-in map-sheet store until the versioned map-sheet format exists: the line and polygon features as GeoJSON
 * ({@code name.mapsheet.geojson}, through {@link SheetVectorExport}), the control points as
 * {@code name.control-points.csv} and the scan and transform kind in {@code name.mapsheet.properties}. Limits:
 * markers and wells are not kept, and a fault polygon comes back closed and counterclockwise (GeoJSON's ring rule).
 */
public final class GeoJsonMapSheetStore implements MapSheetDocumentStore {
    static final String SUFFIX = ".mapsheet.geojson";
    private static final String SCAN = "scan";
    private static final String TRANSFORM = "transform";

    @Override
    public boolean handles(Path file) {
        return file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(SUFFIX);
    }

    @Override
    public Path defaultFileFor(Path scan) {
        return scan.resolveSibling(base(scan.getFileName().toString()) + SUFFIX);
    }

    @Override
    public void save(Path file, MapSheetDocument document) throws IOException {
        new GeoJsonWriter(FileUnits.METRES, "").write(SheetVectorExport.features(document.sheet()), file);
        String base = sheetBase(file);
        ControlPointCsv.write(document.controlPoints(), file.resolveSibling(base + ".control-points.csv"));
        Properties settings = new Properties();
        settings.setProperty(TRANSFORM, document.transformKind().name());
        document.scan().ifPresent(scan -> settings.setProperty(SCAN, relative(file, scan)));
        try (Writer out = Files.newBufferedWriter(file.resolveSibling(base + ".mapsheet.properties"),
                StandardCharsets.UTF_8)) {
            settings.store(out, "Faultbench map sheet: scan and georeference transform");
        }
    }

    @Override
    public MapSheetDocument load(Path file) throws IOException {
        MapSheet sheet = new MapSheet();
        String name = file.getFileName().toString();
        List<VectorFeature> features = new GeoJsonReader(FileUnits.METRES).read(file);
        for (int i = 0; i < features.size(); i++) {
            sheet.add(feature(name, i, features.get(i)));
        }
        String base = sheetBase(file);
        Path csv = file.resolveSibling(base + ".control-points.csv");
        List<ControlPoint> points = Files.exists(csv) ? ControlPointCsv.read(csv) : List.of();
        Properties settings = new Properties();
        Path propertiesFile = file.resolveSibling(base + ".mapsheet.properties");
        if (Files.exists(propertiesFile)) {
            try (Reader in = Files.newBufferedReader(propertiesFile, StandardCharsets.UTF_8)) {
                settings.load(in);
            }
        }
        TransformKind kind;
        try {
            kind = TransformKind.valueOf(settings.getProperty(TRANSFORM, TransformKind.AFFINE.name()).strip());
        } catch (IllegalArgumentException unknown) {
            throw new FormatException(propertiesFile.getFileName().toString(), 0, 0, "transform must be one of "
                    + List.of(TransformKind.values()) + ", found '" + settings.getProperty(TRANSFORM) + "'");
        }
        Optional<Path> scan = Optional.ofNullable(settings.getProperty(SCAN))
                .map(s -> file.toAbsolutePath().resolveSibling(s).normalize());
        return new MapSheetDocument(sheet, points, kind, scan);
    }

    private static SheetFeature feature(String file, int index, VectorFeature vector) throws FormatException {
        Map<String, Object> p = vector.properties();
        String where = "feature " + (index + 1);
        try {
            FeatureId id = new FeatureId(((Number) required(p, "id", where)).longValue());
            String layer = (String) required(p, SheetVectorExport.LAYER, where);
            switch (layer) {
                case "contour":
                    return new ContourFeature(id, (String) required(p, "horizon", where),
                            ((Number) required(p, "depth", where)).doubleValue(), (LineString) vector.geometry());
                case "fault trace":
                    return new FaultTraceFeature(id, (String) required(p, "fault", where),
                            (LineString) vector.geometry(),
                            TraceSide.valueOf((String) required(p, "hangingWallSide", where)));
                case "fault polygon":
                    return new FaultPolygonFeature(id, (String) required(p, "fault", where),
                            (String) required(p, "horizon", where),
                            ((Polygon) vector.geometry()).getExteriorRing());
                case "cut-off":
                    return new CutOffFeature(id, (String) required(p, "fault", where),
                            (String) required(p, "horizon", where),
                            Wall.valueOf((String) required(p, "wall", where)), (LineString) vector.geometry());
                default:
                    throw new IllegalArgumentException("unknown layer '" + layer + "'");
            }
        } catch (IllegalArgumentException | ClassCastException bad) {
            throw new FormatException(file, 0, 0, where + ": " + bad.getMessage());
        }
    }

    private static Object required(Map<String, Object> properties, String key, String where) {
        Object value = properties.get(key);
        if (value == null) {
            throw new IllegalArgumentException("property '" + key + "' is missing");
        }
        return value;
    }

    private static String relative(Path file, Path scan) {
        Path dir = file.toAbsolutePath().getParent();
        return dir.relativize(scan.toAbsolutePath()).toString().replace('\\', '/');
    }

    private static String sheetBase(Path file) {
        String name = file.getFileName().toString();
        return name.toLowerCase(Locale.ROOT).endsWith(SUFFIX) ? name.substring(0, name.length() - SUFFIX.length())
                : base(name);
    }

    private static String base(String name) {
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }
}
