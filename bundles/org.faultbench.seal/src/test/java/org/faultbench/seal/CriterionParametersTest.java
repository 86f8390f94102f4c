package org.faultbench.seal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

class CriterionParametersTest {

    private final CriterionParameters parameters = new CriterionParameters(Path.of("/studies/a"),
            Map.of("table", "tables/mine.csv", "level", 2.0, "units", Map.of("Reef", Map.of("porosity", "high"))));

    @Test
    void readsTextNumbersPathsAndNestedObjects() {
        assertEquals("tables/mine.csv", parameters.text("table").orElseThrow());
        assertEquals(2.0, parameters.number("level").orElseThrow());
        assertEquals(Path.of("/studies/a/tables/mine.csv"), parameters.path("table").orElseThrow());
        assertEquals(List.of("Reef"), parameters.object("units").orElseThrow().keys());
        assertEquals(true, parameters.text("missing").isEmpty());
    }

    @Test
    void errorsStartWithTheKeyPath() {
        CriterionParameters units = parameters.object("units").orElseThrow();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CriterionParameters
                .within("units", () -> CriterionParameters.within("Reef",
                        () -> units.object("Reef").orElseThrow().number("porosity"))));
        assertEquals("units.Reef.porosity: expected a finite number, found high", e.getMessage());
        assertEquals("level: expected a text value in quotes, found 2.0",
                assertThrows(IllegalArgumentException.class, () -> parameters.text("level")).getMessage());
    }

    @Test
    void builtInCriteriaTakeNoParameters() {
        JuxtapositionOnlyCriterion criterion = new JuxtapositionOnlyCriterion();
        assertSame(criterion, criterion.configured(CriterionParameters.NONE));
        Map<String, Object> values = new LinkedHashMap<>();
        values.put("ssfLimit", 4.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> criterion.configured(new CriterionParameters(Path.of("."), values)));
        assertEquals("ssfLimit: unknown parameter; expected one of []", e.getMessage());
    }
}
