package org.faultbench.digitize.importer;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.extension.ElementStub;
import org.faultbench.digitize.io.FormatException;
import org.faultbench.digitize.io.XyzPoint;
import org.faultbench.digitize.io.XyzPoints;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImporterContributionsTest {

    /** A contributed format: "x|y|z" per line. */
    public static final class PipeXyz implements Importer {
        @Override
        public Imported read(Path file, ImportSettings settings) throws IOException {
            List<XyzPoint> points = new ArrayList<>();
            List<String> lines = Files.readAllLines(file);
            for (int i = 0; i < lines.size(); i++) {
                String[] f = lines.get(i).split("\\|");
                if (f.length != 3) {
                    throw new FormatException(file.getFileName().toString(), i + 1, 0, "expected x|y|z");
                }
                points.add(new XyzPoint(Double.parseDouble(f[0]), Double.parseDouble(f[1]),
                        settings.depthSign().toDepth(Double.parseDouble(f[2]))));
            }
            return new Imported.Points(new XyzPoints(points, 0));
        }
    }

    @TempDir
    Path dir;

    private static ElementStub pipe(String bundle, String id, String extensions, String kind) {
        return element("importer").by(bundle).with("id", id).with("name", "x|y|z points")
                .with("extensions", extensions).with("kind", kind).creates("class", new PipeXyz());
    }

    @Test
    void contributedImporterJoinsTheBuiltInsAndBadOnesAreSkipped() {
        ImporterCatalog catalog = ImporterCatalog.withBuiltIns();
        List<String> problems = ImporterContributions.readInto(catalog, ElementStub.all(
                pipe("b.good", "pipe-xyz", ".PXYZ, dat", "points"),
                pipe("b.taken", "las", "pxyz", "points"),
                pipe("b.noext", "noext", " ", "points"),
                pipe("b.kind", "kind", "pxyz", "surface"),
                pipe("b.badext", "badext", "p*z", "points"),
                element("importer").by("b.wrongtype").with("id", "w").with("name", "W").with("extensions", "w")
                        .with("kind", "grid").creates("class", new Object())));
        assertEquals(List.of("esri-ascii", "zmap", "xyz", "well-tops-csv", "geojson", "wkt", "las", "pipe-xyz"),
                catalog.ids());
        assertEquals(5, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("importer 'las' contributed by b.taken: ")
                && problems.get(0).contains("already registered"), problems.get(0));
        assertTrue(problems.get(1).contains("b.noext") && problems.get(1).contains("'extensions' is missing"));
        assertTrue(problems.get(2).contains("b.kind") && problems.get(2).contains("[grid, points, lines, tops, log]"),
                problems.get(2));
        assertTrue(problems.get(3).contains("b.badext") && problems.get(3).contains("'p*z'"), problems.get(3));
        assertTrue(problems.get(4).contains("b.wrongtype") && problems.get(4).contains("does not implement Importer"));
        assertEquals(List.of("pxyz", "dat"), catalog.find("pipe-xyz").orElseThrow().extensions());
    }

    @Test
    void catalogSaysWhichImportersReadAFile() {
        ImporterCatalog catalog = ImporterCatalog.withBuiltIns();
        assertEquals(List.of("esri-ascii"), ids(catalog.forExtension("asc")));
        assertEquals(List.of("esri-ascii"), ids(catalog.forExtension(".ASC")));
        assertEquals(List.of("zmap", "xyz"), ids(catalog.forFile(Path.of("maps", "Top.Sand.DAT"))));
        assertEquals(List.of(), ids(catalog.forFile(Path.of("README"))));
        assertEquals(List.of("esri-ascii", "zmap"), ids(catalog.ofKind(DataKind.GRID)));
    }

    @Test
    void builtInImporterReadsThroughTheCatalog() throws Exception {
        Path file = dir.resolve("top.asc");
        // 2 × 2 cells of 50 m, ESRI ASCII layout (ESRI ArcGIS 10.x help, "Esri ASCII raster format")
        Files.writeString(file, "ncols 2\nnrows 2\nxllcorner 0\nyllcorner 0\ncellsize 50\n1500 1510\n1520 1530\n");
        ImporterType type = ImporterCatalog.withBuiltIns().forFile(file).get(0);
        Imported imported = type.read(file, ImportSettings.METRES_POSITIVE_DOWN);
        Imported.Grid grid = assertInstanceOfGrid(imported);
        assertEquals(2, grid.grid().nx());
        assertEquals(4, grid.grid().values().length);
    }

    @Test
    void contributedImporterReadsAndAKindMismatchIsRefused() throws Exception {
        ImporterCatalog catalog = new ImporterCatalog();
        ImporterContributions.readInto(catalog, ElementStub.all(pipe("b.good", "pipe-xyz", "pxyz", "points"),
                pipe("b.liar", "pipe-as-grid", "pgrid", "grid")));
        Path file = dir.resolve("wells.pxyz");
        Files.writeString(file, "1|2|-1500\n3|4|-1510\n");
        Imported.Points points = (Imported.Points) catalog.forFile(file).get(0).read(file,
                new ImportSettings(org.faultbench.digitize.io.FileUnits.METRES,
                        org.faultbench.digitize.io.DepthSign.NEGATIVE_DOWN));
        assertEquals(1510, points.points().points().get(1).z(), 0);
        Path grid = dir.resolve("wells.pgrid");
        Files.writeString(grid, "1|2|3\n");
        IOException e = assertThrows(IOException.class,
                () -> catalog.find("pipe-as-grid").orElseThrow().read(grid, ImportSettings.METRES_POSITIVE_DOWN));
        assertEquals("wells.pgrid: importer 'x|y|z points' (pipe-as-grid) returned points instead of grid",
                e.getMessage());
    }

    @Test
    void pluginXmlContributesEveryBuiltIn() throws Exception {
        String pluginXml = Files.readString(Path.of(System.getProperty("digitize.bundle.dir", "."), "plugin.xml"));
        for (ImporterType type : BuiltInImporters.types()) {
            String entry = "<importer id=\"" + type.id() + "\" name=\"" + type.name() + "\" extensions=\""
                    + String.join(",", type.extensions()) + "\" kind=\""
                    + type.kind().name().toLowerCase(java.util.Locale.ROOT) + "\"";
            assertTrue(pluginXml.contains(entry), entry);
            assertTrue(pluginXml.contains("class=\"" + type.importer().getClass().getName() + "\""), type.id());
        }
    }

    @Test
    void withoutARegistryTheCatalogHoldsTheBuiltIns() {
        assertEquals(ids(BuiltInImporters.types()), ImporterContributions.platformCatalog().ids());
    }

    private static Imported.Grid assertInstanceOfGrid(Imported imported) {
        assertEquals(DataKind.GRID, imported.kind());
        return (Imported.Grid) imported;
    }

    private static List<String> ids(List<ImporterType> types) {
        return types.stream().map(ImporterType::id).toList();
    }
}
