package org.faultbench.digitize.io;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.faultbench.core.fuzz.FuzzRun;
import org.junit.jupiter.api.Test;

/** Mutated XYZ, well-tops CSV, ZMAP+ and ESRI ASCII files either parse or raise {@link FormatException}. */
class TextReadersFuzzTest {
    private static List<byte[]> seeds(String... texts) {
        return java.util.Arrays.stream(texts).map(t -> t.getBytes(StandardCharsets.UTF_8)).toList();
    }

    private static StringReader text(byte[] input) {
        return new StringReader(new String(input, StandardCharsets.UTF_8));
    }

    @Test
    void xyz() throws InterruptedException {
        System.out.println(FuzzRun.run("XYZ", seeds(XyzPointReaderTest.SAMPLE, "1 2 3\n4 5 6\n"),
                FormatException.class, in -> new XyzPointReader(FileUnits.METRES).read(text(in), "p.xyz")));
    }

    @Test
    void wellTopsCsv() throws InterruptedException {
        System.out.println(FuzzRun.run("well tops CSV", seeds(WellTopsCsvReaderTest.SAMPLE,
                "Well,Surface,X,Y,Z,MD\nW-1,Top Sand,1,2,-2450.25,2510.5\n"), FormatException.class,
                in -> new WellTopsCsvReader(FileUnits.METRES, DepthSign.POSITIVE_DOWN).read(text(in), "tops.csv")));
    }

    @Test
    void zmap() throws InterruptedException {
        System.out.println(FuzzRun.run("ZMAP+", seeds(ZmapGridReaderTest.SAMPLE), FormatException.class,
                in -> new ZmapGridReader(FileUnits.METRES).read(text(in), "top.zmap")));
    }

    @Test
    void esriAscii() throws InterruptedException {
        System.out.println(FuzzRun.run("ESRI ASCII grid", seeds(EsriAsciiGridReaderTest.SAMPLE,
                EsriAsciiGridReaderTest.SAMPLE.replace("cellsize      50", "dx 50\ndy 25")), FormatException.class,
                in -> new EsriAsciiGridReader(FileUnits.METRES).read(text(in), "top.asc")));
    }
}
