package org.faultbench.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import org.faultbench.study.StagedOutput;

/**
 * A rendered report, held in memory until written: {@code report.html} (self-contained, images as data: URIs)
 * and {@code report.pdf}. Rendering first and writing last lets a caller fail before touching the output folder;
 * writing goes through a hidden staging folder beside the target, as results.json does, so a failure leaves no
 * half-written report.
 */
public record ReportFiles(String html, byte[] pdf) {
    public static final String HTML_FILE = "report.html";
    public static final String PDF_FILE = "report.pdf";

    /** Builds and renders the report of a run. */
    public static ReportFiles render(ReportInput input) throws IOException {
        Report report = new ReportBuilder().build(input);
        return new ReportFiles(new HtmlReportWriter().write(report), new PdfReportWriter().write(report));
    }

    /** Writes both files into {@code outDir}, all or nothing, as the results are written. */
    public void writeTo(Path outDir) throws IOException {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(HTML_FILE, html.getBytes(StandardCharsets.UTF_8));
        files.put(PDF_FILE, pdf);
        StagedOutput.write(outDir, files);
    }
}
