package org.faultbench.faults.profile;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.extension.ElementStub;
import org.junit.jupiter.api.Test;

class ThrowProfileModelContributionsTest {

    /** Half a cosine wave: 1 at the centre, 0 at the tips. */
    public static final class CosineTaper implements ThrowProfileModel {
        @Override
        public String name() {
            return "Cosine taper";
        }

        @Override
        public double value(double r) {
            return Math.abs(r) >= 1 ? 0 : (1 + Math.cos(Math.PI * r)) / 2;
        }
    }

    @Test
    void contributedShapeJoinsTheBuiltInsAndBadOnesAreSkipped() {
        ThrowProfileModelCatalog catalog = ThrowProfileModelCatalog.withBuiltIns();
        List<String> problems = ThrowProfileModelContributions.readInto(catalog, ElementStub.all(
                element("model").by("b.good").with("id", "cosine").with("name", "Cosine").creates("class", new CosineTaper()),
                element("model").by("b.taken").with("id", "bell").with("name", "Bell").creates("class", new CosineTaper()),
                element("model").by("b.flat").with("id", "flat").with("name", "Flat").creates("class",
                        (ThrowProfileModel) new ThrowProfileModel() {
                            public String name() {
                                return "half";
                            }

                            public double value(double r) {
                                return 0.5;
                            }
                        }),
                element("model").by("b.noname").with("id", "x").creates("class", new CosineTaper())));
        assertEquals(List.of("elliptical", "bell", "linear-taper", "cosine"), catalog.ids());
        assertEquals(3, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("throw-profile model 'bell' contributed by b.taken: ")
                && problems.get(0).contains("already registered"), problems.get(0));
        assertTrue(problems.get(1).contains("b.flat") && problems.get(1).contains("must be 1 at the centre"));
        assertTrue(problems.get(2).contains("b.noname") && problems.get(2).contains("attribute 'name' is missing"));
    }

    @Test
    void pluginXmlContributesEveryBuiltInUnderItsId() throws Exception {
        String pluginXml = Files.readString(Path.of(System.getProperty("faults.bundle.dir", "."), "plugin.xml"));
        List<ThrowProfileModel> builtIns = ThrowProfileModel.builtIns();
        for (int i = 0; i < builtIns.size(); i++) {
            String entry = "id=\"" + ThrowProfileModelCatalog.BUILT_IN_IDS.get(i) + "\"";
            assertTrue(pluginXml.contains(entry) && pluginXml.contains(builtIns.get(i).getClass().getName()), entry);
        }
    }

    @Test
    void withoutARegistryTheCatalogHoldsTheBuiltIns() {
        assertEquals(ThrowProfileModelCatalog.BUILT_IN_IDS, ThrowProfileModelContributions.platformCatalog().ids());
    }
}
