package org.faultbench.juxtaposition.paint;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.extension.ElementStub;
import org.junit.jupiter.api.Test;

class AttributePainterContributionsTest {

    /** Throw in 50 m bands, grey by band. */
    public static final class ThrowBands implements AttributePainter {
        public String id() {
            return "throw-bands";
        }

        public String name() {
            return "Throw in 50 m bands";
        }

        public int rgb(FaultPlaneCell cell, PaintScene scene) {
            return Math.abs(cell.throwAt()) < 50 ? Rgb.of(220, 220, 220) : Rgb.of(90, 90, 90);
        }

        public List<LegendEntry> legend(PaintScene scene) {
            return List.of(new LegendEntry(Rgb.of(220, 220, 220), "throw < 50 m"),
                    new LegendEntry(Rgb.of(90, 90, 90), "throw >= 50 m"));
        }
    }

    @Test
    void contributedPainterJoinsTheBuiltInsAndBadOnesAreSkipped() {
        AttributePainterCatalog catalog = AttributePainterCatalog.withBuiltIns();
        List<String> problems = AttributePainterContributions.readInto(catalog, ElementStub.all(
                element("painter").by("b.good").with("id", "throw-bands").with("name", "Throw bands")
                        .creates("class", new ThrowBands()),
                element("painter").by("b.otherid").with("id", "bands").with("name", "Bands")
                        .creates("class", new ThrowBands()),
                element("painter").by("b.taken").with("id", "juxtaposition").with("name", "Mine")
                        .creates("class", new BuiltInPainters.Juxtaposition()),
                element("painter").by("b.type").with("id", "x").with("name", "X").creates("class", "no painter"),
                element("painter").by("b.crash").with("id", "y").with("name", "Y")
                        .creates("class", new IllegalStateException("static initialiser failed")),
                element("overlay").by("b.element").with("id", "z").with("name", "Z")
                        .creates("class", new ThrowBands())));
        assertEquals(List.of("juxtaposition", "seal-attribute", "leak-probability", "throw-bands"), catalog.ids());
        assertEquals(5, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("attribute painter 'bands' contributed by b.otherid: ")
                && problems.get(0).contains("reports id 'throw-bands'"), problems.get(0));
        assertTrue(problems.get(1).contains("b.taken") && problems.get(1).contains("already registered"));
        assertTrue(problems.get(2).contains("b.type") && problems.get(2).contains("does not implement AttributePainter"));
        assertTrue(problems.get(3).contains("b.crash") && problems.get(3).contains("static initialiser failed"));
        assertTrue(problems.get(4).contains("b.element") && problems.get(4).contains("<painter>"), problems.get(4));
    }

    @Test
    void pluginXmlContributesEveryBuiltIn() throws Exception {
        String pluginXml = Files.readString(Path.of(System.getProperty("juxtaposition.bundle.dir", "."),
                "plugin.xml"));
        for (AttributePainter painter : BuiltInPainters.painters()) {
            String entry = "<painter id=\"" + painter.id() + "\" name=\"" + painter.name() + "\"";
            assertTrue(pluginXml.contains(entry), entry);
            assertTrue(pluginXml.contains("class=\"" + painter.getClass().getName() + "\""), painter.id());
        }
        for (Overlay overlay : OverlayCatalog.withBuiltIns().list()) {
            assertTrue(pluginXml.contains("<overlay id=\"" + overlay.id() + "\" name=\"" + overlay.name() + "\""));
            assertTrue(pluginXml.contains("class=\"" + overlay.getClass().getName() + "\""), overlay.id());
        }
    }

    @Test
    void withoutARegistryTheCatalogsHoldTheBuiltIns() {
        assertEquals(List.of("juxtaposition", "seal-attribute", "leak-probability"),
                AttributePainterContributions.platformCatalog().ids());
        assertEquals(List.of("shallowest-window"), OverlayContributions.platformCatalog().ids());
    }
}
