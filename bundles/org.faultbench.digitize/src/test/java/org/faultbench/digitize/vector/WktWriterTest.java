package org.faultbench.digitize.vector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.digitize.io.FileUnits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/** WKT writing in the layout {@link WktReader} reads, checked by reading back (OGC Simple Features WKT). */
class WktWriterTest {
    private static final GeometryFactory FACTORY = new GeometryFactory();

    @TempDir
    Path dir;

    @Test
    void featuresSurviveARoundTripWithAttributesAsText() throws IOException {
        List<VectorFeature> original = GeoJsonWriterTest.sampleFeatures();
        Path file = dir.resolve("faults.wkt");
        new WktWriter(FileUnits.METRES).write(original, file);
        List<VectorFeature> back = new WktReader(FileUnits.METRES).read(file);
        assertEquals(original.size(), back.size());
        for (int f = 0; f < original.size(); f++) {
            assertTrue(original.get(f).geometry().equalsExact(back.get(f).geometry()), "feature " + f);
        }
        assertEquals(1850.5, back.get(0).geometry().getCoordinates()[1].getZ(), 1e-9);
        // attributes come back as text; features without one get empty text
        assertEquals(Map.of("name", "F1", "throw", "45.5", "sealing", "true", "kind", ""), back.get(0).properties());
        assertEquals("heave", back.get(2).properties().get("kind"));
    }

    @Test
    void layoutIsHeaderThenOneLinePerFeature() throws IOException {
        StringWriter text = new StringWriter();
        VectorFeature line = new VectorFeature(FACTORY.createLineString(
                new Coordinate[] { new Coordinate(304.8, 0), new Coordinate(0, 609.6) }), Map.of("name", "F9"));
        new WktWriter(FileUnits.of(LengthUnit.FOOT)).write(List.of(line), text);
        // 304.8 m = 1000 ft, 609.6 m = 2000 ft
        assertEquals("WKT\tname\nLINESTRING (1000 0, 0 2000)\tF9\n", text.toString());
        List<VectorFeature> back = new WktReader(FileUnits.of(LengthUnit.FOOT))
                .read(new StringReader(text.toString()), "ft.wkt");
        assertEquals(304.8, back.get(0).geometry().getCoordinates()[0].x, 1e-9);
    }

    @Test
    void attributeWithATabIsRefused() {
        VectorFeature bad = new VectorFeature(GeoJsonWriterTest.sampleFeatures().get(1).geometry(),
                Map.of("name", "a\tb"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new WktWriter(FileUnits.METRES).write(List.of(bad), new StringWriter()));
        assertTrue(e.getMessage().contains("attribute 'name' holds a tab"), e.getMessage());
    }
}
