package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.Severity;
import org.faultbench.digitize.sketch.TopologyChecker;
import org.faultbench.digitize.sketch.TopologyProblem;
import org.faultbench.digitize.sketch.WellFeature;
import org.junit.jupiter.api.Test;

/**
 * The demo's map sheet (invented data) gathers what the demo keeps in exchange files: the digitized contours and
 * cut-offs, the fault traces, the wells with their tops, and the scan's control points. It must read, match those
 * files, and be free of topology errors, so that a geologist opening it sees a clean sheet.
 */
class DemoMapSheetTest {
    private static final Path DEMO = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));

    private static MapSheetFile demo() throws Exception {
        Path file = DEMO.resolve("maps/demo.mapsheet.json");
        return new MapSheetFileFormat().read(Files.readAllBytes(file), file.toString());
    }

    @Test
    void holdsTheDemoFilesFeatures() throws Exception {
        MapSheetFile file = demo();
        MapSheet sheet = file.sheet();
        assertEquals(countOf(DEMO.resolve("maps/digitized-contours.geojson")), sheet.features(ContourFeature.class)
                .size());
        assertEquals(List.of("F-West", "F-East", "F-North"), sheet.features(FaultTraceFeature.class).stream()
                .map(FaultTraceFeature::fault).toList());
        assertEquals(countOf(DEMO.resolve("maps/cut-offs.geojson")), sheet.features(CutOffFeature.class).size());
        List<WellFeature> wells = sheet.features(WellFeature.class);
        assertEquals(Files.readAllLines(DEMO.resolve("wells/wells.csv")).size() - 1, wells.size());
        assertEquals(1512.9, wells.get(0).topsOn("Top Sand A").get(0).tvdss(), 0, "EX-1 in wells/tops.csv");
        assertEquals("depth-structure-scan.png", file.image().orElseThrow());
        assertEquals(TransformKind.AFFINE, file.transform());
        assertEquals(9, file.controlPoints().size());
    }

    @Test
    void hasNoTopologyErrors() throws Exception {
        // the cut-off check also proves each trace's hanging-wall side agrees with its fault's dip azimuth
        List<TopologyProblem> errors = new TopologyChecker(1).check(demo().sheet()).stream()
                .filter(p -> p.severity() == Severity.ERROR).toList();
        assertTrue(errors.isEmpty(), errors.toString());
    }

    private static long countOf(Path geoJson) throws Exception {
        return com.google.gson.JsonParser.parseString(Files.readString(geoJson)).getAsJsonObject()
                .getAsJsonArray("features").size();
    }
}
