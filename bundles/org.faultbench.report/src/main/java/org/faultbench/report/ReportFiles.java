package org.faultbench.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.stream.Stream;

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

    public void writeTo(Path outDir) throws IOException {
        Path absolute = outDir.toAbsolutePath();
        Files.createDirectories(absolute.getParent());
        Path staging = Files.createTempDirectory(absolute.getParent(), ".faultbench-report-");
        try {
            Files.writeString(staging.resolve(HTML_FILE), html, StandardCharsets.UTF_8);
            Files.write(staging.resolve(PDF_FILE), pdf);
            Files.createDirectories(absolute);
            for (String name : new String[] { HTML_FILE, PDF_FILE }) {
                Files.move(staging.resolve(name), absolute.resolve(name), StandardCopyOption.REPLACE_EXISTING,
                        StandardCopyOption.ATOMIC_MOVE);
            }
        } finally {
            deleteQuietly(staging);
        }
    }

    private static void deleteQuietly(Path dir) {
        try (Stream<Path> walk = Files.walk(dir)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // the staging folder is hidden and temporary; leaving it behind is harmless
        }
    }
}
