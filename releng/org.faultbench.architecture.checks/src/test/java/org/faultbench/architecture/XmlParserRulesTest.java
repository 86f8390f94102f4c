package org.faultbench.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class XmlParserRulesTest {
    @Test
    void factoryCallsOutsideSafeXmlAreViolations() {
        String source = "class A { void f() { var f = javax.xml.parsers.DocumentBuilderFactory.newInstance();\n"
                + "var s = SAXParserFactory .newInstance(); var x = XMLInputFactory.newFactory(); } }";
        assertEquals(3, XmlParserRules.violations("bundles/x/src/main/java/A.java", source).size());
    }

    @Test
    void safeXmlItselfAndCommentsAreAllowed() {
        String call = "DocumentBuilderFactory.newInstance();";
        assertEquals(List.of(), XmlParserRules.violations(
                "bundles/org.faultbench.core/src/main/java/org/faultbench/core/io/SafeXml.java", call));
        assertEquals(List.of(), XmlParserRules.violations("A.java", "// never " + call + "\n/* nor " + call + " */"));
    }
}
