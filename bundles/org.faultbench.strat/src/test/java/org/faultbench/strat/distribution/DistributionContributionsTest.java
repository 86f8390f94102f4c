package org.faultbench.strat.distribution;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.faultbench.core.extension.ElementStub;
import org.faultbench.core.uncertain.LogNormalValue;
import org.faultbench.core.uncertain.NormalValue;
import org.faultbench.core.uncertain.TriangularValue;
import org.faultbench.core.uncertain.UncertainValue;
import org.junit.jupiter.api.Test;

class DistributionContributionsTest {

    /** Normal from mean and coefficient of variation, as a plug-in might add. */
    public static final class MeanCv implements DistributionFactory {
        @Override
        public UncertainValue create(Map<String, Double> p) {
            return UncertainValue.normal(p.get("mean"), p.get("mean") * p.get("cv"));
        }
    }

    private static ElementStub meanCv(String bundle, String id, String parameters) {
        return element("distribution").by(bundle).with("id", id).with("name", "Mean and CV")
                .with("parameters", parameters).creates("class", new MeanCv());
    }

    @Test
    void contributedParameterisationJoinsTheBuiltInsAndBadOnesAreSkipped() {
        DistributionCatalog catalog = DistributionCatalog.withBuiltIns();
        List<String> problems = DistributionContributions.readInto(catalog, ElementStub.all(
                meanCv("b.good", "meanCv", "mean, cv"),
                meanCv("b.reserved", "lognormal", "mean,cv"),
                meanCv("b.taken", "p90p10Normal", "mean,cv"),
                meanCv("b.noparams", "n", ""),
                meanCv("b.key", "k", "mean,c v"),
                meanCv("b.twice", "t", "mean,mean")));
        assertEquals(List.of("p90p10Lognormal", "p90p10Normal", "minMostLikelyMax", "meanCv"), catalog.ids());
        assertEquals(5, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("distribution 'lognormal' contributed by b.reserved: ")
                && problems.get(0).contains("reserved"), problems.get(0));
        assertTrue(problems.get(1).contains("b.taken") && problems.get(1).contains("already registered"));
        assertTrue(problems.get(2).contains("b.noparams") && problems.get(2).contains("'parameters' is missing"));
        assertTrue(problems.get(3).contains("b.key") && problems.get(3).contains("'c v'"));
        assertTrue(problems.get(4).contains("b.twice") && problems.get(4).contains("distinct"));
        NormalValue n = (NormalValue) catalog.find("meanCv").orElseThrow().create(Map.of("mean", 30.0, "cv", 0.1));
        assertEquals(3, n.standardDeviation(), 1e-12);
    }

    @Test
    void p90p10LognormalHitsItsPercentiles() {
        // lognormal median 100, σ_ln 0.5: P90 52.69, P10 189.80 (exceedance convention, PRMS 2018 glossary;
        // z0.9 = 1.28155, Abramowitz and Stegun 1964 table 26.1, from memory)
        LogNormalValue v = (LogNormalValue) DistributionCatalog.withBuiltIns().find("p90p10Lognormal").orElseThrow()
                .create(Map.of("p90", 52.69, "p10", 189.80));
        assertEquals(100, v.median(), 0.01);
        assertEquals(0.5, v.sigmaLn(), 1e-4);
        assertEquals(52.69, v.quantile(0.1), 1e-9);
        assertEquals(189.80, v.quantile(0.9), 1e-9);
    }

    @Test
    void p90p10NormalHitsItsPercentiles() {
        // Normal(100, 10): P90 87.18, P10 112.82 (same sources)
        NormalValue v = (NormalValue) DistributionCatalog.withBuiltIns().find("p90p10Normal").orElseThrow()
                .create(Map.of("p90", 87.18, "p10", 112.82));
        assertEquals(100, v.mean(), 1e-9);
        assertEquals(10, v.standardDeviation(), 0.01);
    }

    @Test
    void minMostLikelyMaxIsTheTriangular() {
        TriangularValue v = (TriangularValue) DistributionCatalog.withBuiltIns().find("minMostLikelyMax")
                .orElseThrow().create(Map.of("min", 20.0, "mostLikely", 30.0, "max", 45.0));
        assertEquals(new TriangularValue(20, 30, 45), v);
        // triangular mean (a + c + b) / 3 (Evans, Hastings and Peacock 2000, ch. 40; from memory)
        assertEquals(95.0 / 3, v.nominal(), 1e-12);
    }

    @Test
    void wrongParametersAreNamed() {
        DistributionType type = DistributionCatalog.withBuiltIns().find("p90p10Lognormal").orElseThrow();
        IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                () -> type.create(Map.of("p90", 10.0)));
        assertTrue(missing.getMessage().startsWith("p90p10Lognormal expects the parameters [p90, p10], found"),
                missing.getMessage());
        IllegalArgumentException reversed = assertThrows(IllegalArgumentException.class,
                () -> type.create(Map.of("p90", 200.0, "p10", 50.0)));
        assertTrue(reversed.getMessage().startsWith("p10 must exceed p90"), reversed.getMessage());
        assertThrows(IllegalArgumentException.class, () -> type.create(Map.of("p90", Double.NaN, "p10", 50.0)));
    }

    @Test
    void pluginXmlContributesEveryBuiltIn() throws Exception {
        String pluginXml = Files.readString(Path.of(System.getProperty("strat.bundle.dir", "."), "plugin.xml"));
        for (DistributionType type : BuiltInDistributions.types()) {
            String entry = "<distribution id=\"" + type.id() + "\" name=\"" + type.name() + "\"";
            assertTrue(pluginXml.contains(entry), entry);
            assertTrue(pluginXml.contains("parameters=\"" + String.join(",", type.parameterNames()) + "\""), entry);
            assertTrue(pluginXml.contains("class=\"" + type.factory().getClass().getName() + "\""), entry);
        }
    }

    @Test
    void withoutARegistryTheCatalogHoldsTheBuiltIns() {
        assertEquals(List.of("p90p10Lognormal", "p90p10Normal", "minMostLikelyMax"),
                DistributionContributions.platformCatalog().ids());
    }
}
