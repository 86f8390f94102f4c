package org.faultbench.digitize.importer;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.digitize.io.EsriAsciiGridReader;
import org.faultbench.digitize.io.WellTopsCsvReader;
import org.faultbench.digitize.io.XyzPointReader;
import org.faultbench.digitize.io.ZmapGridReader;
import org.faultbench.digitize.las.LasReader;
import org.faultbench.digitize.vector.GeoJsonReader;
import org.faultbench.digitize.vector.WktReader;

/**
 * The readers of {@code digitize.io}, {@code vector} and {@code las} as importers: classes the extension registry
 * can create, named in this bundle's plugin.xml, and the same entries for use without a registry.
 */
public final class BuiltInImporters {

    /** ESRI ASCII grid. */
    public static final class EsriAscii implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Grid(new EsriAsciiGridReader(s.units()).read(file));
        }
    }

    /** ZMAP+ grid. */
    public static final class Zmap implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Grid(new ZmapGridReader(s.units()).read(file));
        }
    }

    /** x y z points, whitespace or comma separated. */
    public static final class Xyz implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Points(new XyzPointReader(s.units()).read(file));
        }
    }

    /** Well tops as CSV. */
    public static final class WellTopsCsv implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Tops(new WellTopsCsvReader(s.units(), s.depthSign()).read(file));
        }
    }

    /** GeoJSON features. */
    public static final class GeoJson implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Lines(new GeoJsonReader(s.units()).read(file));
        }
    }

    /** Well-known text geometries, one per line. */
    public static final class Wkt implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Lines(new WktReader(s.units()).read(file));
        }
    }

    /** LAS 2.0 well log. */
    public static final class Las implements Importer {
        @Override
        public Imported read(Path file, ImportSettings s) throws IOException {
            return new Imported.Log(new LasReader(s.units()).read(file));
        }
    }

    /** The built-ins as plugin.xml declares them (same ids, names, extensions and kinds). */
    static final List<ImporterType> TYPES = List.of(
            new ImporterType("esri-ascii", "ESRI ASCII grid", List.of("asc"), DataKind.GRID, new EsriAscii()),
            new ImporterType("zmap", "ZMAP+ grid", List.of("zmap", "dat"), DataKind.GRID, new Zmap()),
            new ImporterType("xyz", "x y z points", List.of("xyz", "txt", "dat"), DataKind.POINTS, new Xyz()),
            new ImporterType("well-tops-csv", "Well tops (CSV)", List.of("csv"), DataKind.TOPS, new WellTopsCsv()),
            new ImporterType("geojson", "GeoJSON", List.of("geojson", "json"), DataKind.LINES, new GeoJson()),
            new ImporterType("wkt", "Well-known text (WKT)", List.of("wkt"), DataKind.LINES, new Wkt()),
            new ImporterType("las", "LAS 2.0 well log", List.of("las"), DataKind.LOG, new Las()));

    private BuiltInImporters() {
    }

    /** The built-in importer types, in catalog order. */
    public static List<ImporterType> types() {
        return TYPES;
    }
}
