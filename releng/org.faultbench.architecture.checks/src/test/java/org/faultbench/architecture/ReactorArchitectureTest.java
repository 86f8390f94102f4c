package org.faultbench.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/** Applies the layering rules to every bundle of this source tree. */
class ReactorArchitectureTest {
    private static final Path ROOT = Path.of(System.getProperty("faultbench.root", "../..")).normalize();

    private static List<Path> bundleDirs() throws IOException {
        try (Stream<Path> dirs = Files.list(ROOT.resolve("bundles"))) {
            return dirs.filter(d -> Files.isRegularFile(d.resolve("META-INF/MANIFEST.MF"))).sorted().toList();
        }
    }

    @Test
    void modelBundlesStayFreeOfUserInterfaceLibraries() throws IOException {
        Map<String, BundleManifest> manifests = new HashMap<>();
        for (Path dir : bundleDirs()) {
            BundleManifest m = BundleManifest.read(dir.resolve("META-INF/MANIFEST.MF"));
            manifests.put(dir.getFileName().toString(), m);
        }
        assertTrue(manifests.size() >= 10, "bundles found under " + ROOT + ": " + manifests.keySet());
        Map<String, String> layers = new HashMap<>();
        manifests.values().forEach(m -> layers.put(m.symbolicName(), m.layer()));

        List<String> problems = new ArrayList<>();
        for (Map.Entry<String, BundleManifest> e : manifests.entrySet()) {
            problems.addAll(LayerRules.manifestViolations(e.getValue(), layers));
            if ("model".equals(e.getValue().layer())) {
                problems.addAll(sourceProblems(ROOT.resolve("bundles").resolve(e.getKey()).resolve("src")));
            }
        }
        assertEquals(List.of(), problems);
        assertTrue(layers.containsValue("model") && layers.containsValue("ui"), layers.toString());
    }

    private static List<String> sourceProblems(Path src) throws IOException {
        if (!Files.isDirectory(src)) {
            return List.of();
        }
        try (Stream<Path> files = Files.walk(src)) {
            return files.filter(f -> f.toString().endsWith(".java")).flatMap(f -> {
                try {
                    return LayerRules.sourceViolations(ROOT.relativize(f).toString(),
                            Files.readString(f, StandardCharsets.UTF_8)).stream();
                } catch (IOException ex) {
                    throw new UncheckedIOException(ex);
                }
            }).toList();
        }
    }

    @Test
    void xmlParsersAreCreatedOnlyBySafeXml() throws IOException {
        List<String> problems = new ArrayList<>();
        for (Path dir : bundleDirs()) {
            Path src = dir.resolve("src");
            if (!Files.isDirectory(src)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(src)) {
                for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    problems.addAll(XmlParserRules.violations(ROOT.relativize(f).toString(),
                            Files.readString(f, StandardCharsets.UTF_8)));
                }
            }
        }
        assertEquals(List.of(), problems);
    }

    @Test
    void noEclipseUpdateSiteIsReferenced() throws IOException {
        List<String> offenders = new ArrayList<>();
        try (Stream<Path> files = Files.walk(ROOT)) {
            for (Path f : files.filter(Files::isRegularFile).filter(ReactorArchitectureTest::isBuildFile).toList()) {
                String text = Files.readString(f, StandardCharsets.UTF_8);
                if (text.contains("download.eclipse.org") || text.contains("type=\"InstallableUnit\"")
                        || text.contains("<layout>p2</layout>")) {
                    offenders.add(ROOT.relativize(f).toString());
                }
            }
        }
        assertEquals(List.of(), offenders, "only Maven Central is reachable: no p2 update site may be referenced");
    }

    private static boolean isBuildFile(Path f) {
        String name = f.getFileName().toString();
        String path = f.toString();
        return !path.contains("/target/") && !path.contains("/.git/")
                && (name.equals("pom.xml") || name.endsWith(".target") || name.endsWith(".product"));
    }
}
