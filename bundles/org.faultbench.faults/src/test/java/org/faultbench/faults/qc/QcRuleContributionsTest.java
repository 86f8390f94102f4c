package org.faultbench.faults.qc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IContributor;
import org.eclipse.core.runtime.Status;
import org.junit.jupiter.api.Test;

class QcRuleContributionsTest {

    /** A contributed rule: every fault longer than 10 km gets a warning. */
    static final class LongFaultRule implements FaultQcRule {
        private final String id;

        LongFaultRule(String id) {
            this.id = id;
        }

        @Override
        public String id() {
            return id;
        }

        @Override
        public String name() {
            return "Long fault";
        }

        @Override
        public List<QcFinding> check(FaultQcContext ctx) {
            return ctx.fault().length() > 10_000 ? List.of(new QcFinding(id, Severity.WARNING, ctx.fault().id(),
                    Double.NaN, null, "longer than 10 km", "check the linkage")) : List.of();
        }
    }

    /** A configuration element as the extension registry would hand it over. */
    private static IConfigurationElement element(String contributor, String name, Map<String, String> attributes,
            Object created) {
        IContributor who = (IContributor) Proxy.newProxyInstance(IContributor.class.getClassLoader(),
                new Class<?>[] {IContributor.class}, (p, m, a) -> m.getName().equals("getName") ? contributor : null);
        return (IConfigurationElement) Proxy.newProxyInstance(IConfigurationElement.class.getClassLoader(),
                new Class<?>[] {IConfigurationElement.class}, (p, m, a) -> {
                    switch (m.getName()) {
                    case "getName":
                        return name;
                    case "getAttribute":
                        return attributes.get((String) a[0]);
                    case "getContributor":
                        return who;
                    case "createExecutableExtension":
                        if (created instanceof CoreException e) {
                            throw e;
                        }
                        return created;
                    default:
                        return null;
                    }
                });
    }

    @Test
    void validContributionIsRegisteredBesideTheBuiltIns() {
        QcRuleCatalog catalog = QcRuleCatalog.withBuiltIns();
        List<String> problems = QcRuleContributions.readInto(catalog, new IConfigurationElement[] {
            element("com.example.qc", "rule", Map.of("id", "long-fault", "class", "x"),
                    new LongFaultRule("long-fault"))});
        assertEquals(List.of(), problems);
        assertTrue(catalog.find("long-fault").isPresent());
        assertTrue(catalog.find(PolarityFlipRule.ID).isPresent());
    }

    @Test
    void badContributionsAreSkippedAndNamedWithTheirBundle() {
        QcRuleCatalog catalog = QcRuleCatalog.withBuiltIns();
        List<String> problems = QcRuleContributions.readInto(catalog, new IConfigurationElement[] {
            element("bundle.one", "rule", Map.of("id", PolarityFlipRule.ID, "class", "x"),
                    new LongFaultRule(PolarityFlipRule.ID)),
            element("bundle.two", "rule", Map.of("id", "odd", "class", "x"), "not a rule"),
            element("bundle.three", "rule", Map.of("id", "gone", "class", "x"),
                    new CoreException(Status.error("class not found"))),
            element("bundle.four", "rule", Map.of("id", "liar", "class", "x"), new LongFaultRule("other")),
            element("bundle.five", "criterion", Map.of("id", "wrong-element", "class", "x"),
                    new LongFaultRule("wrong-element")),
            element("bundle.six", "rule", Map.of("id", "good", "class", "x"), new LongFaultRule("good"))});
        assertEquals(5, problems.size(), problems.toString());
        assertTrue(problems.get(0).contains("bundle.one") && problems.get(0).contains("already registered"));
        assertTrue(problems.get(1).contains("bundle.two") && problems.get(1).contains("does not implement"));
        assertTrue(problems.get(2).contains("bundle.three") && problems.get(2).contains("class not found"));
        assertTrue(problems.get(3).contains("bundle.four") && problems.get(3).contains("reports id 'other'"));
        assertTrue(problems.get(4).contains("bundle.five") && problems.get(4).contains("<rule>"));
        assertTrue(catalog.find("good").isPresent(), "later contributions still load");
        assertEquals("Throw polarity flip", catalog.find(PolarityFlipRule.ID).orElseThrow().name());
    }
}
