package org.faultbench.digitize.sketch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;

import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.vector.GeoJsonReader;
import org.faultbench.digitize.vector.GeoJsonWriter;
import org.faultbench.digitize.vector.VectorFeature;
import org.faultbench.digitize.vector.WktWriter;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Polygon;

/** Export of line and polygon features to the vector writers, checked by reading GeoJSON back. */
class SheetVectorExportTest {

    private static MapSheet sheet() {
        MapSheet sheet = new MapSheet();
        Sheets.contour(sheet, 1500.5, 0, 0, 100, 0);
        Sheets.trace(sheet, TraceSide.RIGHT, 50, -50, 50, 50);
        Sheets.polygon(sheet, 50, -50, 60, -50, 60, 50);
        Sheets.cutOff(sheet, Wall.HANGING_WALL, 60, -50, 60, 50);
        sheet.add(new MarkerFeature(sheet.nextId(), MarkerKind.SPILL, 10, 10, Sheets.HORIZON, "saddle"));
        sheet.add(new WellFeature(sheet.nextId(), "W-1", 5, 5,
                List.of(new WellTop("W-1", Sheets.HORIZON, 5, 5, 1490, Double.NaN))));
        return sheet;
    }

    @Test
    void linesAndPolygonsAreExportedWithTheirAttributes() {
        List<VectorFeature> features = SheetVectorExport.features(sheet());
        assertEquals(4, features.size(), "markers and wells are points and stay out");
        assertEquals(List.of("contour", "fault trace", "fault polygon", "cut-off"),
                features.stream().map(f -> f.properties().get(SheetVectorExport.LAYER)).toList());
        assertEquals(1500.5, features.get(0).properties().get("depth"));
        assertEquals("RIGHT", features.get(1).properties().get("hangingWallSide"));
        assertEquals("HANGING_WALL", features.get(3).properties().get("wall"));
        assertEquals(4.0, features.get(3).properties().get("id"));
        Polygon zone = (Polygon) features.get(2).geometry();
        // hand calculation: triangle (50,-50), (60,-50), (60,50) closed on its first point, area 10 * 100 / 2
        assertEquals(500, zone.getArea(), 1e-9);
    }

    @Test
    void theExportFeedsTheFileWriters() throws IOException {
        List<VectorFeature> features = SheetVectorExport.features(sheet());
        StringWriter json = new StringWriter();
        new GeoJsonWriter(FileUnits.METRES, "").write(features, json);
        List<VectorFeature> back = new GeoJsonReader(FileUnits.METRES).read(new StringReader(json.toString()),
                "sheet.geojson");
        assertEquals(features.size(), back.size());
        for (int k = 0; k < features.size(); k++) {
            assertTrue(features.get(k).geometry().equalsTopo(back.get(k).geometry()), "feature " + k);
            assertEquals(features.get(k).properties(), back.get(k).properties(), "feature " + k);
        }
        StringWriter wkt = new StringWriter();
        new WktWriter(FileUnits.METRES).write(features, wkt);
        assertTrue(wkt.toString().contains("POLYGON"), wkt.toString());
    }
}
