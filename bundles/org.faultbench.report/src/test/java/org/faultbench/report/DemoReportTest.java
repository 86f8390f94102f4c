package org.faultbench.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.study.ResultsWriter;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo study at reduced realisations, written as results.json and as a report by the same run: every section is
 * in the HTML and the PDF, and the per-unit numbers of both equal those of results.json.
 */
class DemoReportTest {
    private static final Path DEMO = Path.of("../../demo-workspace/studies/demo-study.json");
    private static final String[] LEVELS = { "P90", "P50", "P10", "mean" };

    @TempDir
    static Path dir;
    static String html;
    static String pdfText;
    static byte[] pdf;
    static JsonObject results;

    @BeforeAll
    static void runDemo() throws Exception {
        System.setProperty("java.awt.headless", "true");
        assertTrue(Files.isRegularFile(DEMO), "demo study missing at " + DEMO.toAbsolutePath());
        AnalysisFile analysis = new AnalysisFileReader().read(DEMO);
        SimulationResult result = new MonteCarloSimulator().run(analysis.study(),
                new SimulationSettings(200, analysis.seed(), 2, analysis.cellHeight()), null);
        new ResultsWriter("test").write(analysis, result, dir);
        ReportFiles.render(new ReportInput(analysis, result, "test", LocalDate.of(2026, 1, 2))).writeTo(dir);
        html = Files.readString(dir.resolve(ReportFiles.HTML_FILE), StandardCharsets.UTF_8);
        pdf = Files.readAllBytes(dir.resolve(ReportFiles.PDF_FILE));
        try (PDDocument document = Loader.loadPDF(pdf)) {
            pdfText = new PDFTextStripper().getText(document);
        }
        results = JsonParser.parseString(Files.readString(dir.resolve("results.json"))).getAsJsonObject();
    }

    @Test
    void pdfStartsWithTheIsoHeader() {
        // ISO 32000-1:2008, 7.5.2: a PDF file begins with "%PDF-"
        assertEquals("%PDF-", new String(pdf, 0, 5, StandardCharsets.US_ASCII));
    }

    @Test
    void everySectionIsInTheHtmlAndThePdfInOrder() {
        int htmlAt = -1;
        int pdfAt = -1;
        for (ReportSection s : ReportSection.values()) {
            int h = html.indexOf("<section id=\"" + s.id() + "\">\n<h2>" + s.title() + "</h2>");
            assertTrue(h > htmlAt, "HTML section " + s.id() + " missing or out of order");
            htmlAt = h;
            int p = pdfText.indexOf(s.title(), pdfAt + 1);
            assertTrue(p > pdfAt, "PDF section '" + s.title() + "' missing or out of order");
            pdfAt = p;
        }
    }

    @Test
    void runIdentityAndCautionsAreStated() {
        String sha = results.get("analysisSha256").getAsString();
        String seed = results.get("seed").getAsString();
        for (String text : List.of(sha, seed, "200 of 200", "Faultbench test")) {
            assertTrue(html.contains(text), "HTML lacks " + text);
            assertTrue(pdfText.replace("\n", " ").contains(text), "PDF lacks " + text);
        }
        for (String caution : ResultsWriter.CAUTIONS) {
            assertEquals(2, count(html, HtmlReportWriter.escape(caution)), "caution at top and end: " + caution);
        }
        assertTrue(html.contains("P90 = low case"), "exceedance convention stated");
    }

    @Test
    void unitTablesMatchResultsJson() {
        List<String> units = new ArrayList<>();
        for (JsonElement u : results.getAsJsonArray("units")) {
            units.add(u.getAsJsonObject().get("name").getAsString());
        }
        assertEquals(5, units.size(), "Sands A to E");
        String flatPdf = pdfText.replace("\n", " ");
        int resultsStart = flatPdf.indexOf(ReportSection.RESULTS.title() + " ");
        int resultsEnd = flatPdf.indexOf(ReportSection.LEAK_PROBABILITY.title(), resultsStart);
        for (int k = 0; k < units.size(); k++) {
            JsonObject unit = results.getAsJsonArray("units").get(k).getAsJsonObject();
            String tableStart = "<table id=\"results-" + Slug.of(units.get(k)) + "\">";
            int from = html.indexOf(tableStart);
            assertTrue(from >= 0, "HTML table of " + units.get(k));
            String table = html.substring(from, html.indexOf("</table>", from));
            int pdfFrom = flatPdf.indexOf(units.get(k) + ": contacts", resultsStart);
            int pdfTo = k + 1 < units.size() ? flatPdf.indexOf(units.get(k + 1) + ": contacts", pdfFrom) : resultsEnd;
            assertTrue(pdfFrom >= 0 && pdfTo > pdfFrom, "PDF table of " + units.get(k));
            String pdfTable = flatPdf.substring(pdfFrom, pdfTo);
            JsonObject quantities = unit.getAsJsonObject("quantities");
            int checked = 0;
            for (String q : quantities.keySet()) {
                JsonObject stats = quantities.getAsJsonObject(q);
                String kind = stats.get("unit").getAsString();
                for (String level : LEVELS) {
                    String expected = number(stats.get(level), kind);
                    assertTrue(table.contains(">" + expected + "<"), units.get(k) + " " + q + " " + level + " = "
                            + expected + " not in the HTML table");
                    assertTrue(pdfTable.contains(expected), units.get(k) + " " + q + " " + level + " = " + expected
                            + " not in the PDF table");
                    checked++;
                    if (stats.has("stockTankBarrels")) {
                        String bbl = ReportNumbers.volume(
                                stats.getAsJsonObject("stockTankBarrels").get(level).getAsDouble());
                        assertTrue(table.contains(">" + bbl + "<"), units.get(k) + " " + q + " stb " + level);
                        assertTrue(pdfTable.contains(bbl), units.get(k) + " " + q + " stb " + level + " in PDF");
                    }
                }
            }
            assertEquals(40, checked, "ten quantities, four statistics each");
            for (String mechanism : unit.getAsJsonObject("mechanismFractions").keySet()) {
                String share = ReportNumbers.percent(
                        unit.getAsJsonObject("mechanismFractions").get(mechanism).getAsDouble());
                assertTrue(html.contains("-controlled " + share), units.get(k) + " " + mechanism + " " + share);
            }
        }
    }

    @Test
    void everyFigureIsEmbeddedAndEveryFaultHasItsDiagrams() {
        for (String fault : List.of("f-west", "f-east")) {
            for (String kind : List.of("throw-", "allan-", "leak-")) {
                assertTrue(html.contains("<figure id=\"" + kind + fault + "\">\n<img alt="), kind + fault);
            }
        }
        assertEquals(1 + 2 * 3 + 5, count(html, "src=\"data:image/png;base64,"), "map, 3 per fault, 5 tornados");
    }

    private static String number(JsonElement value, String unit) {
        return value == null || value.isJsonNull() ? ReportNumbers.MISSING
                : ReportNumbers.quantity(value.getAsDouble(), unit);
    }

    private static int count(String text, String part) {
        int n = 0;
        for (int at = text.indexOf(part); at >= 0; at = text.indexOf(part, at + 1)) {
            n++;
        }
        return n;
    }
}
