package org.faultbench.digitize.vector;

import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.faultbench.digitize.io.FileUnits;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.WKTWriter;

/**
 * Writes features in the layout {@link WktReader} reads: a tab-separated header {@code WKT<tab>name...} when any
 * feature has attributes, then one line per feature, its geometry as OGC Well-Known Text (JTS; with Z where the
 * geometry has depths) followed by its attribute values as text. Metres are converted to the declared
 * {@link FileUnits}. Attribute text may not contain tabs or line breaks, which would break the layout.
 */
public final class WktWriter {
    private final FileUnits units;

    public WktWriter(FileUnits units) {
        if (units == null) {
            throw new IllegalArgumentException("file units missing");
        }
        this.units = units;
    }

    /** Writes {@code features} to {@code file}, replacing it only once the whole text is ready. */
    public void write(List<VectorFeature> features, Path file) throws IOException {
        StringWriter text = new StringWriter();
        write(features, text);
        Files.writeString(file, text.toString(), StandardCharsets.UTF_8);
    }

    public void write(List<VectorFeature> features, Writer out) throws IOException {
        if (features == null) {
            throw new IllegalArgumentException("feature list missing");
        }
        Set<String> names = new LinkedHashSet<>();
        features.forEach(feature -> names.addAll(feature.properties().keySet()));
        if (!names.isEmpty()) {
            List<String> header = new ArrayList<>(List.of(WktReader.HEADER));
            names.forEach(name -> header.add(text(name, name)));
            out.write(joined(header));
        }
        for (VectorFeature feature : features) {
            List<String> fields = new ArrayList<>();
            fields.add(wkt(feature.geometry()));
            for (String name : names) {
                fields.add(text(name, feature.properties().get(name)));
            }
            out.write(joined(fields));
        }
        out.flush();
    }

    private String wkt(Geometry geometry) {
        Geometry inFileUnits = FeatureGeometry.converted(geometry, units.xy()::fromMetres, units.z()::fromMetres);
        boolean hasDepth = false;
        for (Coordinate c : geometry.getCoordinates()) {
            hasDepth |= !Double.isNaN(c.getZ());
        }
        return new WKTWriter(hasDepth ? 3 : 2).write(inFileUnits);
    }

    private static String text(String name, Object value) {
        String text = value == null ? "" : value.toString();
        if (text.contains(WktReader.SEPARATOR) || text.contains("\n") || text.contains("\r")) {
            throw new IllegalArgumentException("attribute '" + name + "' holds a tab or line break, which the WKT "
                    + "text layout cannot carry: '" + text + "'");
        }
        return text;
    }

    private static String joined(List<String> fields) {
        return String.join(WktReader.SEPARATOR, fields) + "\n";
    }
}
