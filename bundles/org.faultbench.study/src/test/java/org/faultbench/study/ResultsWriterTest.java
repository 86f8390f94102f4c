package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.UnitQuantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResultsWriterTest {
    @TempDir
    Path dir;

    @Test
    void resultsJsonAndSummaryCarryTheNumbersAndTheirProvenance() throws Exception {
        AnalysisFile analysis = new AnalysisFileReader().read(DomeStudyFiles.write(dir, 20, "sgr"));
        SimulationResult result = new MonteCarloSimulator().run(analysis.study(), new SimulationSettings(40, 9, 2, 5),
                new NullProgressMonitor());
        Path out = dir.resolve("out");
        new ResultsWriter("9.9.9-test").write(analysis, result, out);

        JsonObject json = JsonParser.parseString(Files.readString(out.resolve("results.json"))).getAsJsonObject();
        assertEquals("faultbench-results", json.get("format").getAsString());
        assertEquals("9.9.9-test", json.getAsJsonObject("program").get("version").getAsString());
        assertEquals(analysis.sha256(), json.get("analysisSha256").getAsString());
        assertEquals(9, json.get("seed").getAsLong());
        assertEquals(40, json.get("realisationsRun").getAsInt());
        assertTrue(json.get("conventions").getAsJsonObject().get("percentiles").getAsString().contains("P90 = low case"));
        assertTrue(json.getAsJsonArray("cautions").toString().contains("licensed professionals"));
        JsonObject contact = json.getAsJsonArray("units").get(0).getAsJsonObject().getAsJsonObject("quantities")
                .getAsJsonObject("contact");
        assertEquals(result.units().get(0).statistics(UnitQuantity.CONTACT).level(ExceedanceLevel.P50),
                contact.get("P50").getAsDouble(), 0);
        assertEquals("Dome test", json.getAsJsonObject("inputs").get("name").getAsString());
        JsonObject stoiip = json.getAsJsonArray("units").get(0).getAsJsonObject().getAsJsonObject("quantities")
                .getAsJsonObject("stoiip");
        // 1 m3 = 6.2898 bbl (NIST SP 811: 1 bbl = 0.158987294928 m3)
        assertEquals(stoiip.get("P50").getAsDouble() * 6.2898,
                stoiip.getAsJsonObject("stockTankBarrels").get("P50").getAsDouble(), 1e-4 * stoiip.get("P50").getAsDouble());

        List<String> summary = Files.readAllLines(out.resolve("summary.csv"), StandardCharsets.UTF_8);
        assertTrue(summary.get(0).startsWith("unit,quantity,measure,P90_low,P50,P10_high"));
        assertEquals(1 + 2 * UnitQuantity.values().length, summary.size(), "one row per reservoir unit and quantity");
        assertTrue(Files.exists(out.resolve("leak-probability-F1.csv")));
        try (var left = Files.list(dir)) {
            assertTrue(left.noneMatch(p -> p.getFileName().toString().startsWith(".faultbench-out-")),
                    "the staging folder is removed");
        }
    }

    @Test
    void pluginInputsAreWrittenWithTheDistributionDrawn() throws Exception {
        String json = DomeStudyFiles.VALID_TEMPLATE.replace("CRITERION", "ssf").replace("THICKNESS_A", "30")
                .replace("\"attic\":", "\"sampledInputs\": [{\"id\": \"ssf-maximum-sealing\"}], \"attic\":");
        AnalysisFile analysis = new AnalysisFileReader().read(DomeStudyFiles.writeJson(dir, 20, json));
        SimulationResult result = new MonteCarloSimulator().run(analysis.study(), new SimulationSettings(10, 9, 1, 5),
                new NullProgressMonitor());
        Path out = dir.resolve("out");
        new ResultsWriter("9.9.9-test").write(analysis, result, out);
        JsonObject input = JsonParser.parseString(Files.readString(out.resolve("results.json"))).getAsJsonObject()
                .getAsJsonArray("sampledInputs").get(0).getAsJsonObject();
        assertEquals("ssf-maximum-sealing", input.get("id").getAsString());
        assertEquals("CRITERION", input.get("target").getAsString());
        // the file names no distribution: the built-in default, uniform 4 to 7 (Gibson 1994; Lindsay et al. 1993)
        assertEquals("{\"uniform\":{\"min\":4.0,\"max\":7.0}}", input.get("distribution").toString());
    }

    @Test
    void quantityKeysAreCamelCase() {
        assertEquals("atticStoiip", ResultsWriter.key(UnitQuantity.ATTIC_STOIIP));
        assertEquals("contact", ResultsWriter.key(UnitQuantity.CONTACT));
    }
}
