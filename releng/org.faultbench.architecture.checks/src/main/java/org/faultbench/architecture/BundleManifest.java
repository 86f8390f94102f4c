package org.faultbench.architecture;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.jar.Attributes;
import java.util.jar.Manifest;

/** The parts of a bundle's META-INF/MANIFEST.MF that the architecture rules look at. */
public record BundleManifest(String symbolicName, String layer, List<String> requiredBundles, List<String> importedPackages) {

    public static BundleManifest read(Path manifestFile) throws IOException {
        try (InputStream in = Files.newInputStream(manifestFile)) {
            return parse(new Manifest(in));
        }
    }

    static BundleManifest parse(Manifest manifest) {
        Attributes main = manifest.getMainAttributes();
        String name = firstClause(main.getValue("Bundle-SymbolicName"));
        return new BundleManifest(name, main.getValue("Faultbench-Layer"),
                names(main.getValue("Require-Bundle")), names(main.getValue("Import-Package")));
    }

    private static String firstClause(String header) {
        List<String> all = names(header);
        return all.isEmpty() ? null : all.get(0);
    }

    /** Names of an OSGi header's clauses, without attributes and directives. */
    static List<String> names(String header) {
        List<String> result = new ArrayList<>();
        if (header == null) {
            return result;
        }
        StringBuilder clause = new StringBuilder();
        boolean quoted = false;
        for (char c : header.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            }
            if (c == ',' && !quoted) {
                result.add(nameOf(clause));
                clause.setLength(0);
            } else {
                clause.append(c);
            }
        }
        if (!clause.toString().isBlank()) {
            result.add(nameOf(clause));
        }
        return result;
    }

    private static String nameOf(CharSequence clause) {
        return clause.toString().split(";", 2)[0].trim();
    }
}
