package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IContributor;
import org.eclipse.core.runtime.Status;
import org.faultbench.core.LithologyClass;
import org.junit.jupiter.api.Test;

class SealCriterionContributionsTest {

    /** A contributed criterion: every point seals at 1 bar. */
    static final class FlatCriterion implements SealCriterion {
        private final String id;

        FlatCriterion(String id) {
            this.id = id;
        }

        @Override
        public String id() {
            return id;
        }

        @Override
        public String name() {
            return "Flat 1 bar";
        }

        @Override
        public Set<LithologyClass> validFor() {
            return Set.of(LithologyClass.CARBONATE);
        }

        @Override
        public SealEvaluation evaluate(FaultPointContext ctx) {
            return new SealEvaluation("flat", "", 1, 1e5, SealBasis.FAULT_ROCK);
        }
    }

    /** A configuration element as the extension registry would hand it over. */
    private static IConfigurationElement element(String contributor, Map<String, String> attributes, Object created) {
        IContributor who = (IContributor) Proxy.newProxyInstance(getClass(IContributor.class),
                new Class<?>[] { IContributor.class }, (p, m, a) -> m.getName().equals("getName") ? contributor : null);
        return (IConfigurationElement) Proxy.newProxyInstance(getClass(IConfigurationElement.class),
                new Class<?>[] { IConfigurationElement.class }, (p, m, a) -> {
                    switch (m.getName()) {
                    case "getName":
                        return "criterion";
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

    private static ClassLoader getClass(Class<?> type) {
        return type.getClassLoader();
    }

    @Test
    void validContributionIsRegisteredBesideTheBuiltIns() {
        SealCriterionCatalog catalog = SealCriterionCatalog.withBuiltIns();
        List<String> problems = SealCriterionContributions.readInto(catalog, new IConfigurationElement[] {
                element("com.example.flat", Map.of("id", "flat", "class", "x"), new FlatCriterion("flat")) });
        assertEquals(List.of(), problems);
        assertTrue(catalog.find("flat").isPresent());
        assertTrue(catalog.find("sgr").isPresent());
    }

    @Test
    void badContributionsAreSkippedAndNamedWithTheirBundle() {
        SealCriterionCatalog catalog = SealCriterionCatalog.withBuiltIns();
        List<String> problems = SealCriterionContributions.readInto(catalog, new IConfigurationElement[] {
                element("bundle.one", Map.of("id", "sgr", "class", "x"), new FlatCriterion("sgr")),
                element("bundle.two", Map.of("id", "odd", "class", "x"), "not a criterion"),
                element("bundle.three", Map.of("id", "gone", "class", "x"),
                        new CoreException(Status.error("class not found"))),
                element("bundle.four", Map.of("id", "liar", "class", "x"), new FlatCriterion("other")),
                element("bundle.five", Map.of("id", "good", "class", "x"), new FlatCriterion("good")) });
        assertEquals(4, problems.size(), problems.toString());
        assertTrue(problems.get(0).contains("bundle.one") && problems.get(0).contains("already registered"));
        assertTrue(problems.get(1).contains("bundle.two") && problems.get(1).contains("does not implement"));
        assertTrue(problems.get(2).contains("bundle.three") && problems.get(2).contains("class not found"));
        assertTrue(problems.get(3).contains("bundle.four"));
        assertTrue(catalog.find("good").isPresent(), "later contributions still load");
        assertEquals("Shale gouge ratio", catalog.find("sgr").orElseThrow().name().substring(0, 17));
    }
}
