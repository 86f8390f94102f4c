package org.faultbench.headless;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo workspace's study runs end to end through the batch command at reduced realisations. */
class DemoStudyRunTest {
    private static final Path DEMO = Path.of("../../demo-workspace/studies/demo-study.json");

    @TempDir
    Path dir;

    @Test
    void demoStudyRunsAndWritesConsistentResults() throws Exception {
        assertTrue(Files.isRegularFile(DEMO), "demo study missing at " + DEMO.toAbsolutePath());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Path results = dir.resolve("results");
        int code = HeadlessApplication.run(new String[] { "analyze", DEMO.toString(), "--realisations", "120",
                "--threads", "2", "--out", results.toString() }, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(ExitCode.OK, code, err.toString(StandardCharsets.UTF_8));
        String table = out.toString(StandardCharsets.UTF_8);
        assertTrue(table.contains("P90 (low)") && table.contains("CAUTION"), table);

        JsonObject json = JsonParser.parseString(Files.readString(results.resolve("results.json"))).getAsJsonObject();
        assertEquals(120, json.get("realisationsRun").getAsInt());
        var units = json.getAsJsonArray("units");
        assertEquals(5, units.size(), "Sands A to E");
        for (var unit : units) {
            JsonObject contact = unit.getAsJsonObject().getAsJsonObject("quantities").getAsJsonObject("contact");
            double p90 = contact.get("P90").getAsDouble();
            double p50 = contact.get("P50").getAsDouble();
            double p10 = contact.get("P10").getAsDouble();
            assertTrue(p90 <= p50 && p50 <= p10, "exceedance order P90 <= P50 <= P10 for " + unit);
        }
        assertTrue(Files.readString(results.resolve("summary.csv")).lines().count() > 5);
        assertTrue(Files.size(results.resolve("report.pdf")) > 0 && Files.size(results.resolve("report.html")) > 0,
                "report written beside results.json");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("Writing report.html and report.pdf"));
        try (var staging = Files.list(dir)) {
            assertEquals(1, staging.count(), "no staging folder left behind");
        }
    }
}
