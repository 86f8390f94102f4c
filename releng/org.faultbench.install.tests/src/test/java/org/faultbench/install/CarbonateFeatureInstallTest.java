package org.faultbench.install;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.zip.GZIPInputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The optional carbonate seal feature, installed by the p2 director from the project's p2 repository (see pom.xml),
 * shows up in the product: its bundle is in the product's configuration, and the headless analysis of a carbonate
 * case runs with it, while the plain product refuses the case because the criterion is unknown.
 */
class CarbonateFeatureInstallTest {
    private static final Path PLAIN = Path.of(System.getProperty("faultbench.product"));
    private static final Path EXTENDED = Path.of(System.getProperty("faultbench.extendedProduct"));
    private static final Path CASE = Path.of(System.getProperty("faultbench.carbonateCase"));

    private record Run(int exitCode, String output) {
    }

    private static Run analyze(Path product, Path out) throws IOException, InterruptedException {
        return analyze(product, CASE, out);
    }

    private static Run analyze(Path product, Path analysisFile, Path out) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("sh", product.resolve("faultbench.sh").toString(),
                "-application", "org.faultbench.headless.batch", "analyze", analysisFile.toString(), "--realisations",
                "200",
                "--seed", "7", "--out", out.toString(), "--no-report"));
        Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(5, TimeUnit.MINUTES), "the headless run finishes");
        return new Run(process.exitValue(), output);
    }

    private static String bundlesInfo(Path product) throws IOException {
        return Files.readString(product.resolve(
                "configuration/org.eclipse.equinox.simpleconfigurator/bundles.info"));
    }

    @Test
    void theDirectorInstalledTheFeatureIntoTheCopyOnly() throws IOException {
        assertTrue(bundlesInfo(EXTENDED).contains("org.faultbench.seal.carbonate,"),
                "the carbonate bundle is configured in the extended product");
        assertFalse(bundlesInfo(PLAIN).contains("org.faultbench.seal.carbonate,"),
                "the plain product does not have it");
        assertTrue(profileText(EXTENDED.resolve("p2/org.eclipse.equinox.p2.engine/profileRegistry/DefaultProfile.profile")
                .resolve(newestProfile())).contains("org.faultbench.carbonate.feature.feature.group"),
                "p2 recorded the installed feature in the product's profile");
    }

    /** A p2 profile file, plain or gzipped. */
    private static String profileText(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            InputStream content = file.toString().endsWith(".gz") ? new GZIPInputStream(in) : in;
            return new String(content.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static String newestProfile() throws IOException {
        try (var files = Files.list(EXTENDED.resolve(
                "p2/org.eclipse.equinox.p2.engine/profileRegistry/DefaultProfile.profile"))) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".profile.gz")
                    || n.endsWith(".profile")).sorted().reduce((a, b) -> b).orElseThrow();
        }
    }

    @Test
    void theCarbonateCriterionShowsUpInTheHeadlessRunOnlyWhenInstalled(@TempDir Path out) throws Exception {
        Run plain = analyze(PLAIN, out.resolve("plain"));
        assertNotEquals(0, plain.exitCode(), plain.output());
        assertTrue(plain.output().contains("carbonate-fault-rock"), "the plain product names the unknown criterion: "
                + plain.output());

        Run extended = analyze(EXTENDED, out.resolve("extended"));
        assertEquals(0, extended.exitCode(), extended.output());
        String results = Files.readString(out.resolve("extended/results.json"));
        assertTrue(results.contains("carbonate-fault-rock"), "results name the installed criterion");
    }

    /** The plug-in registry of the running product, not the fallback of plain unit tests, supplies the input. */
    @Test
    void theProductsContributedSampledInputIsDrawnWhenAStudyNamesIt(@TempDir Path work) throws Exception {
        Path folder = Files.createDirectories(work.resolve("case"));
        Files.copy(CASE.resolveSibling("top-reef-a.asc"), folder.resolve("top-reef-a.asc"));
        String json = Files.readString(CASE);
        int seal = json.indexOf("\"seal\":");
        int simulation = json.indexOf("\"simulation\":");
        Path study = Files.writeString(folder.resolve("ssf-study.json"), json.substring(0, seal)
                + "\"seal\": {\"criterion\": \"ssf\", \"burialDepth\": 2000},\n"
                + "  \"sampledInputs\": [{\"id\": \"ssf-maximum-sealing\"}],\n  " + json.substring(simulation));
        Run run = analyze(PLAIN, study, work.resolve("out"));
        assertEquals(0, run.exitCode(), run.output());
        String results = Files.readString(work.resolve("out/results.json"));
        assertTrue(results.contains("\"target\": \"CRITERION\""), "results list the drawn input: " + results);
    }
}
