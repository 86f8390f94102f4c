package org.faultbench.seal.carbonate;

import static org.faultbench.seal.carbonate.TestColumns.carbonate;
import static org.faultbench.seal.carbonate.TestColumns.column;
import static org.faultbench.seal.carbonate.TestColumns.point;
import static org.faultbench.seal.carbonate.TestColumns.sand;
import static org.faultbench.seal.carbonate.TestColumns.shale;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.seal.ApplicabilityWarning;
import org.faultbench.seal.ClaySmearPotentialCriterion;
import org.faultbench.seal.CriterionParameters;
import org.faultbench.seal.SealBasis;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.SealEvaluation;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.ShaleSmearFactorCriterion;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CarbonateFaultRockCriterionTest {

    /** Seal 50 m, Reef A 30 m, Lime B 40 m, Sand C 40 m (positions 0-50, 50-80, 80-120, 120-160). */
    private final ResolvedColumn column = column(shale("Top Seal", 50), carbonate("Reef A", 30),
            carbonate("Lime B", 40), sand("Sand C", 40));

    private final CarbonateFaultRockCriterion criterion = new CarbonateFaultRockCriterion(
            FaultRockThresholdTable.bundled(), Map.of("Reef A", new HostRock(CarbonateFacies.GRAINSTONE, 0.22),
                    "Lime B", new HostRock(CarbonateFacies.PACKSTONE, 0.12)), ThresholdCase.MODE);

    @Test
    void carbonateAgainstCarbonateTakesTheWeakerWallsFaultRock() {
        // FW position 85 (Lime B, packstone 12 %: 2 bar mode) against HW position 65 (Reef A, grainstone 22 %:
        // 5 bar mode): the lower, 2 bar (seed table after Michie et al. 2014, JSG 65; values from memory)
        SealEvaluation evaluation = criterion.evaluate(point(column, 85, 20));
        assertEquals(SealBasis.FAULT_ROCK, evaluation.basis());
        assertEquals(2e5, evaluation.thresholdPressure(), 1e-6);
        assertEquals(2, evaluation.attributeValue(), 1e-12);
        assertEquals("bar", evaluation.attributeUnit());
        // self-juxtaposed Reef A: 5 bar
        assertEquals(5e5, criterion.evaluate(point(column, 75, 10)).thresholdPressure(), 1e-6);
    }

    @Test
    void carbonateAgainstSealIsAJuxtapositionSeal() {
        // reservoir facing non-reservoir seals by juxtaposition (Allan 1989, AAPG Bull. 73; Watts 1987)
        SealEvaluation evaluation = criterion.evaluate(point(column, 60, 20));
        assertEquals(Double.POSITIVE_INFINITY, evaluation.thresholdPressure());
        assertEquals(SealBasis.JUXTAPOSITION, evaluation.basis());
    }

    @Test
    void withoutFaultRockOrFaciesItIsJuxtapositionOnly() {
        assertEquals(0, criterion.evaluate(point(column, 60, 0)).thresholdPressure(), "zero throw: no fault rock");
        // carbonate against sandstone: the table says nothing about it (conservative: leaks)
        assertEquals(0, criterion.evaluate(point(column, 125, 10)).thresholdPressure());
        CarbonateFaultRockCriterion unconfigured = new CarbonateFaultRockCriterion();
        assertEquals(0, unconfigured.evaluate(point(column, 75, 10)).thresholdPressure(),
                "a unit without a facies earns no credit");
        CarbonateFaultRockCriterion mudstone = new CarbonateFaultRockCriterion(FaultRockThresholdTable.bundled(),
                Map.of("Reef A", new HostRock(CarbonateFacies.WACKESTONE_MUDSTONE, 0.1)), ThresholdCase.MAX);
        // micrite-dominated host: conduit, no credit (Michie et al. 2014, JSG 65)
        assertEquals(0, mudstone.evaluate(point(column, 75, 10)).thresholdPressure());
    }

    @Test
    void parametersChooseFaciesCaseAndTable(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("lab.csv"), FaultRockThresholdTable.HEADER + "\npackstone,0,1,7,8,9,lab\n");
        SealCriterion configured = criterion.configured(new CriterionParameters(dir, Map.of("table", "lab.csv",
                "thresholdCase", "max", "units", Map.of("Reef A", Map.of("facies", "packstone", "porosity", 0.3)))));
        assertEquals(9e5, configured.evaluate(point(column, 75, 10)).thresholdPressure(), 1e-6);
        assertEquals(0, criterion.evaluate(point(column, 60, 0)).thresholdPressure(), "the original is unchanged");
        assertEquals(5e5, criterion.evaluate(point(column, 75, 10)).thresholdPressure(), 1e-6);
    }

    @Test
    void badParametersSayWhichKeyIsWrong(@TempDir Path dir) {
        assertEquals("thresholdCase: expected \"min\", \"mode\" or \"max\", found \"P50\"",
                configureError(dir, Map.of("thresholdCase", "P50")));
        assertEquals("units.Reef A.facies: expected a facies, one of [grainstone, packstone, wackestone-mudstone, "
                + "boundstone, dolomite]; found 'reef'",
                configureError(dir, Map.of("units", Map.of("Reef A", Map.of("facies", "reef", "porosity", 0.1)))));
        assertEquals("units.Reef A.porosity: porosity must be a fraction in [0, 1], was 12.0",
                configureError(dir, Map.of("units", Map.of("Reef A", Map.of("facies", "grainstone", "porosity", 12.0)))));
        assertEquals("units.Reef A.porosity: required field is missing",
                configureError(dir, Map.of("units", Map.of("Reef A", Map.of("facies", "grainstone")))));
        assertEquals("burial: unknown parameter; expected one of [units, table, thresholdCase]",
                configureError(dir, Map.of("burial", 1.0)));
        assertTrue(configureError(dir, Map.of("table", "none.csv")).startsWith("table: cannot read "));
    }

    private String configureError(Path dir, Map<String, Object> values) {
        return assertThrows(IllegalArgumentException.class,
                () -> criterion.configured(new CriterionParameters(dir, values))).getMessage();
    }

    @Test
    void clayBasedCriteriaWarnOnCarbonatesAndThisOneDoesNot() {
        // clay-based rules do not apply to carbonates (Michie et al. 2014, JSG 65; common practice)
        for (SealCriterion clayBased : List.of(new ShaleGougeRatioCriterion(), new ShaleSmearFactorCriterion(),
                new ClaySmearPotentialCriterion(1))) {
            List<ApplicabilityWarning> warnings = clayBased.applicabilityWarnings(point(column, 100, 60));
            assertEquals(List.of("Reef A", "Lime B"), warnings.stream().map(ApplicabilityWarning::unitName).toList(),
                    clayBased.id());
            assertTrue(warnings.stream().allMatch(w -> w.lithology() == LithologyClass.CARBONATE));
        }
        assertEquals(List.of(), criterion.applicabilityWarnings(point(column, 100, 60)));
        assertEquals(List.of("Sand C"), criterion.applicabilityWarnings(point(column, 140, 30)).stream()
                .map(ApplicabilityWarning::unitName).toList(), "sandstone fault rock is outside the table");
    }
}
