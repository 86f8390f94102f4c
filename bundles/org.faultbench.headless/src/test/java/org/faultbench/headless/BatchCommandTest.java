package org.faultbench.headless;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BatchCommandTest {
    @TempDir
    Path dir;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        return HeadlessApplication.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    @Test
    void helpPrintsUsageAndSucceeds() {
        assertEquals(ExitCode.OK, run("--help"));
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("analyze <analysis file>"), text);
        assertTrue(text.contains("licensed"), "usage carries the caution: " + text);
    }

    @Test
    void noArgumentsIsAUsageError() {
        assertEquals(ExitCode.USAGE, run());
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("no command given"));
    }

    @Test
    void unknownCommandIsNamed() {
        assertEquals(ExitCode.USAGE, run("simulate"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("unknown command 'simulate'"));
    }

    @Test
    void analyzeOptionsAreParsed() {
        BatchCommand c = BatchCommand.parse(new String[] { "analyze", "study.json", "--realisations", "500",
                "--seed", "42", "--threads", "2", "--out", "res" });
        AnalyzeCommand a = assertInstanceOf(AnalyzeCommand.class, c);
        assertEquals(Path.of("study.json"), a.analysisFile());
        assertEquals(500, a.realisations().getAsInt());
        assertEquals(42L, a.seed().getAsLong());
        assertEquals(2, a.threads());
        assertEquals(Path.of("res"), a.outDir());
        assertTrue(a.report(), "the report is written unless --no-report");
    }

    @Test
    void noReportIsAFlagWithoutValue() {
        AnalyzeCommand a = assertInstanceOf(AnalyzeCommand.class, BatchCommand.parse(new String[] { "analyze",
                "study.json", "--no-report", "--seed", "3" }));
        assertFalse(a.report());
        assertEquals(3L, a.seed().getAsLong());
    }

    @Test
    void badNumbersAndMissingValuesAreUsageErrors() {
        assertEquals(ExitCode.USAGE, run("analyze", "f.json", "--realisations", "many"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("expects a whole number, got 'many'"));
        assertEquals(ExitCode.USAGE, run("analyze", "f.json", "--seed"));
        assertEquals(ExitCode.USAGE, run("analyze", "f.json", "--threads", "0"));
        assertEquals(ExitCode.USAGE, run("analyze"));
        assertEquals(ExitCode.USAGE, run("analyze", "f.json", "--colour", "red"));
    }

    @Test
    void badAnalysisFileNamesTheFieldAndWritesNothing() throws Exception {
        Path file = dir.resolve("broken.json");
        Files.writeString(file, "{\"format\": \"faultbench-analysis\", \"formatVersion\": 1,"
                + " \"stratigraphy\": {\"referenceUnit\": \"A\", \"units\": []}}");
        Path outDir = dir.resolve("results");
        assertEquals(ExitCode.BAD_INPUT, run("analyze", file.toString(), "--out", outDir.toString()));
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("broken.json") && message.contains("stratigraphy.referenceUnit"), message);
        assertTrue(Files.notExists(outDir), "nothing is written when the input is bad");
    }

    @Test
    void missingAnalysisFileIsBadInput() {
        assertEquals(ExitCode.BAD_INPUT, run("analyze", dir.resolve("absent.json").toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("not found"));
    }
}
