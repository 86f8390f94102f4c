package org.faultbench.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.jar.Manifest;

import org.junit.jupiter.api.Test;

/** The rules themselves must catch what they are meant to catch (otherwise the tree scan proves nothing). */
class LayerRulesTest {

    private static BundleManifest manifest(String text) throws IOException {
        return BundleManifest.parse(new Manifest(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8))));
    }

    @Test
    void modelBundleImportingSwtIsCaught() throws IOException {
        BundleManifest m = manifest("Manifest-Version: 1.0\nBundle-SymbolicName: x.model;singleton:=true\n"
                + "Faultbench-Layer: model\nImport-Package: org.apache.commons.math3.util;version=\"[3.6.0,4.0.0)\",\n"
                + " org.eclipse.swt.widgets\n");
        List<String> problems = LayerRules.manifestViolations(m, Map.of());
        assertEquals(List.of("x.model (model) imports UI package org.eclipse.swt.widgets"), problems);
    }

    @Test
    void modelBundleRequiringAFaultbenchUiBundleIsCaught() throws IOException {
        BundleManifest m = manifest("Manifest-Version: 1.0\nBundle-SymbolicName: x.model\nFaultbench-Layer: model\n"
                + "Require-Bundle: x.view;bundle-version=\"0.1.0\",org.eclipse.jface\n");
        List<String> problems = LayerRules.manifestViolations(m, Map.of("x.view", "ui"));
        assertEquals(2, problems.size(), problems.toString());
    }

    @Test
    void uiBundleMayUseSwtAndMissingLayerIsCaught() throws IOException {
        BundleManifest ui = manifest("Manifest-Version: 1.0\nBundle-SymbolicName: x.ui\nFaultbench-Layer: ui\n"
                + "Require-Bundle: org.eclipse.ui\n");
        assertTrue(LayerRules.manifestViolations(ui, Map.of()).isEmpty());
        BundleManifest none = manifest("Manifest-Version: 1.0\nBundle-SymbolicName: x.y\n");
        assertEquals(1, LayerRules.manifestViolations(none, Map.of()).size());
    }

    @Test
    void sourceImportsAreCheckedButSimilarNamesAreNot() {
        String src = "package a;\nimport org.eclipse.swt.SWT;\nimport static org.eclipse.ui.PlatformUI.x;\n"
                + "import org.eclipse.uikit.Thing;\nimport org.eclipse.core.runtime.IProgressMonitor;\n";
        assertEquals(List.of("A.java imports org.eclipse.swt.SWT", "A.java imports org.eclipse.ui.PlatformUI.x"),
                LayerRules.sourceViolations("A.java", src));
    }
}
