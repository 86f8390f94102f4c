package org.faultbench.headless;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.sim.ResultOutput;
import org.faultbench.sim.SimulationResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code analyze} runs the contributed result outputs after results.json; a failing one is a warning only. */
class AnalyzeResultOutputsTest {
    private static final Path DEMO = Path.of("../../demo-workspace/studies/demo-study.json");

    @TempDir
    Path dir;

    private static final class UnitCountOutput implements ResultOutput {
        boolean sawResultsJson;

        public String id() {
            return "unit-count";
        }

        public String name() {
            return "Unit count";
        }

        public void write(SimulationResult result, Path outputDirectory) throws IOException {
            sawResultsJson = Files.isRegularFile(outputDirectory.resolve("results.json"));
            Files.writeString(outputDirectory.resolve("unit-count.txt"), Integer.toString(result.units().size()));
        }
    }

    private static final class BrokenOutput implements ResultOutput {
        public String id() {
            return "broken";
        }

        public String name() {
            return "Broken";
        }

        public void write(SimulationResult result, Path outputDirectory) throws IOException {
            throw new IOException("database not reachable");
        }
    }

    @Test
    void contributedOutputsRunAfterTheResultsAndFailuresBecomeWarnings() throws Exception {
        assertTrue(Files.isRegularFile(DEMO), "demo study missing at " + DEMO.toAbsolutePath());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Path results = dir.resolve("results");
        UnitCountOutput unitCount = new UnitCountOutput();
        BatchContext context = new BatchContext(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), "test",
                () -> List.of(new BrokenOutput(), unitCount));
        int code = BatchCommand.parse(new String[] { "analyze", DEMO.toString(), "--realisations", "20", "--threads",
                "1", "--no-report", "--out", results.toString() }).execute(context);
        String console = err.toString(StandardCharsets.UTF_8);
        assertEquals(ExitCode.OK, code, console);
        assertTrue(unitCount.sawResultsJson, "outputs run after results.json is written");
        assertEquals("5", Files.readString(results.resolve("unit-count.txt")), "Sands A to E of the demo study");
        assertTrue(console.contains("faultbench: warning: result output 'Broken' (broken) failed: "
                + "java.io.IOException: database not reachable"), console);
    }
}
