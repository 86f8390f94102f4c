package org.faultbench.strat.lithology;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.extension.ElementStub;
import org.faultbench.core.io.SafeXml;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;

class LithologyCatalogueContributionsTest {

    private static ElementStub lithology(String id, String lithologyClass, String vclMin, String vclMax) {
        return element("lithology").with("id", id).with("name", id).with("lithologyClass", lithologyClass)
                .with("vclMin", vclMin).with("vclMax", vclMax).with("porosityMin", "0.1").with("porosityMax", "0.2");
    }

    @Test
    void contributedCatalogueJoinsTheBuiltInAndBadOnesAreSkippedWhole() {
        LithologyCatalogues all = LithologyCatalogues.withBuiltIns();
        List<String> problems = LithologyCatalogueContributions.readInto(all, ElementStub.all(
                element("catalogue").by("b.good").with("id", "delta").with("name", "Delta legend")
                        .child(lithology("channel-sand", "reservoir", "0.02", "0.12").with("pattern", "sand-dots"))
                        .child(lithology("prodelta-mud", "seal", "0.6", "0.85")),
                element("catalogue").by("b.range").with("id", "r").with("name", "R")
                        .child(lithology("ok", "seal", "0.5", "0.7"))
                        .child(lithology("upside-down", "seal", "0.7", "0.5")),
                element("catalogue").by("b.class").with("id", "c").with("name", "C")
                        .child(lithology("granite", "crystalline", "0", "0")),
                element("catalogue").by("b.empty").with("id", "e").with("name", "E"),
                element("catalogue").by("b.taken").with("id", "basic").with("name", "Mine")
                        .child(lithology("x", "other", "0", "0"))));
        assertEquals(List.of("basic", "delta"), all.ids());
        LithologyEntry sand = all.entry("delta", "channel-sand").orElseThrow();
        assertEquals(LithologyClass.RESERVOIR, sand.lithologyClass());
        assertEquals(new FractionRange(0.02, 0.12), sand.vcl());
        assertEquals("sand-dots", sand.pattern());
        assertEquals("plain", all.entry("delta", "prodelta-mud").orElseThrow().pattern());
        assertEquals(4, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("lithology catalogue 'r' contributed by b.range: lithology 'upside-down'")
                && problems.get(0).contains("0 <= min <= max <= 1"), problems.get(0));
        assertTrue(problems.get(1).contains("b.class") && problems.get(1).contains("[reservoir, seal, carbonate"),
                problems.get(1));
        assertTrue(problems.get(2).contains("b.empty") && problems.get(2).contains("has no lithology"));
        assertTrue(problems.get(3).contains("b.taken") && problems.get(3).contains("already registered"));
    }

    @Test
    void rangesBecomeUniformInputs() {
        // a uniform range's mean is its midpoint (common practice)
        assertEquals(0.075, new FractionRange(0, 0.15).asUncertainValue().nominal(), 1e-12);
        assertEquals(0.2, new FractionRange(0.2, 0.2).asUncertainValue().nominal(), 0);
    }

    @Test
    void pluginXmlContributesExactlyTheBuiltInCatalogue() throws Exception {
        Element root = SafeXml.parse(Path.of(System.getProperty("strat.bundle.dir", "."), "plugin.xml"))
                .getDocumentElement();
        List<ElementStub> catalogues = new ArrayList<>();
        for (Element extension : children(root, "extension")) {
            if (extension.getAttribute("point").equals(LithologyCatalogueContributions.POINT)) {
                children(extension, "catalogue").forEach(c -> catalogues.add(stub(c)));
            }
        }
        LithologyCatalogues fromXml = new LithologyCatalogues();
        assertEquals(List.of(), LithologyCatalogueContributions.readInto(fromXml,
                ElementStub.all(catalogues.toArray(new ElementStub[0]))));
        assertEquals(LithologyCatalogues.withBuiltIns().list(), fromXml.list());
    }

    @Test
    void withoutARegistryTheBuiltInCatalogueIsThere() {
        assertEquals(List.of(LithologyCatalogues.BASIC), LithologyCatalogueContributions.platformCatalogues().ids());
    }

    private static ElementStub stub(Element element) {
        ElementStub stub = element(element.getTagName());
        NamedNodeMap attributes = element.getAttributes();
        for (int i = 0; i < attributes.getLength(); i++) {
            stub.with(attributes.item(i).getNodeName(), attributes.item(i).getNodeValue());
        }
        children(element, null).forEach(child -> stub.child(stub(child)));
        return stub;
    }

    private static List<Element> children(Element parent, String name) {
        List<Element> result = new ArrayList<>();
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element e && (name == null || e.getTagName().equals(name))) {
                result.add(e);
            }
        }
        return result;
    }
}
