package org.faultbench.architecture;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The layering rule of the design: computation lives in model bundles that never see a user-interface library, so
 * it runs headless and tests with plain JUnit; UI bundles depend on model bundles, never the reverse.
 */
public final class LayerRules {
    public static final Set<String> LAYERS = Set.of("model", "ui", "test");

    /** Bundle and package prefixes a model bundle may not depend on or import. */
    static final List<String> FORBIDDEN_IN_MODEL = List.of("org.eclipse.swt", "org.eclipse.jface",
            "org.eclipse.draw2d", "org.eclipse.gef", "org.eclipse.ui", "org.eclipse.e4.ui");

    private static final Pattern JAVA_IMPORT = Pattern.compile("^\\s*import\\s+(?:static\\s+)?([\\w.]+)",
            Pattern.MULTILINE);

    private LayerRules() {
    }

    static boolean forbidden(String name) {
        for (String prefix : FORBIDDEN_IN_MODEL) {
            if (name.equals(prefix) || name.startsWith(prefix + ".")) {
                return true;
            }
        }
        return false;
    }

    /**
     * Violations of one bundle's manifest. {@code layers} maps every known bundle of the reactor to its layer, so a
     * model bundle requiring a UI bundle is caught too.
     */
    public static List<String> manifestViolations(BundleManifest m, Map<String, String> layers) {
        List<String> problems = new ArrayList<>();
        if (m.layer() == null || !LAYERS.contains(m.layer())) {
            problems.add(m.symbolicName() + ": header Faultbench-Layer must be one of " + LAYERS + ", was " + m.layer());
            return problems;
        }
        if (!m.layer().equals("model")) {
            return problems;
        }
        for (String required : m.requiredBundles()) {
            if (forbidden(required)) {
                problems.add(m.symbolicName() + " (model) requires UI bundle " + required);
            } else if ("ui".equals(layers.get(required))) {
                problems.add(m.symbolicName() + " (model) requires Faultbench UI bundle " + required);
            }
        }
        for (String imported : m.importedPackages()) {
            if (forbidden(imported)) {
                problems.add(m.symbolicName() + " (model) imports UI package " + imported);
            }
        }
        return problems;
    }

    /** Violations in one Java source file of a model bundle. */
    public static List<String> sourceViolations(String fileName, String source) {
        List<String> problems = new ArrayList<>();
        Matcher m = JAVA_IMPORT.matcher(source);
        while (m.find()) {
            if (forbidden(m.group(1))) {
                problems.add(fileName + " imports " + m.group(1));
            }
        }
        return problems;
    }
}
