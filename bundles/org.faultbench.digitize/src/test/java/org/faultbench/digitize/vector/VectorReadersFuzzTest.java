package org.faultbench.digitize.vector;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.faultbench.core.fuzz.FuzzRun;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.junit.jupiter.api.Test;

/** Mutated GeoJSON and WKT files either parse or raise {@link FormatException}. */
class VectorReadersFuzzTest {
    private static StringReader text(byte[] input) {
        return new StringReader(new String(input, StandardCharsets.UTF_8));
    }

    @Test
    void geoJson() throws InterruptedException {
        System.out.println(FuzzRun.run("GeoJSON", List.of(GeoJsonReaderTest.SAMPLE.getBytes(StandardCharsets.UTF_8)),
                FormatException.class, in -> new GeoJsonReader(FileUnits.METRES).read(text(in), "f.geojson")));
    }

    @Test
    void wkt() throws InterruptedException {
        System.out.println(FuzzRun.run("WKT", List.of(WktReaderTest.WITH_ATTRIBUTES.getBytes(StandardCharsets.UTF_8),
                "LINESTRING (0 0, 10 10, 20 5)\nPOLYGON ((0 0, 1 0, 1 1, 0 0))\n".getBytes(StandardCharsets.UTF_8)),
                FormatException.class, in -> new WktReader(FileUnits.METRES).read(text(in), "f.wkt")));
    }
}
