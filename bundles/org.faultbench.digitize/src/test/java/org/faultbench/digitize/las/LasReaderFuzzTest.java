package org.faultbench.digitize.las;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.faultbench.core.fuzz.FuzzRun;
import org.faultbench.digitize.io.FileUnits;
import org.faultbench.digitize.io.FormatException;
import org.junit.jupiter.api.Test;

/** Mutated LAS 2.0 files (unwrapped, minimal, wrapped) either parse or raise {@link FormatException}. */
class LasReaderFuzzTest {
    @Test
    void las() throws InterruptedException {
        List<byte[]> seeds = List.of(LasReaderTest.UNWRAPPED, LasReaderTest.MINIMUM_FEET, LasReaderTest.WRAPPED)
                .stream().map(t -> t.getBytes(StandardCharsets.UTF_8)).toList();
        System.out.println(FuzzRun.run("LAS 2.0", seeds, FormatException.class, in -> new LasReader(FileUnits.METRES)
                .read(new StringReader(new String(in, StandardCharsets.UTF_8)), "w.las")));
    }
}
