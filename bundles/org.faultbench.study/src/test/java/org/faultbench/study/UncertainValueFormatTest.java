package org.faultbench.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonParser;

import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.LogNormalValue;
import org.faultbench.core.uncertain.UncertainValue;
import org.junit.jupiter.api.Test;

/** Contributed distribution parameterisations (extension point org.faultbench.strat.distributions) in files. */
class UncertainValueFormatTest {

    private static JsonNode node(String json) {
        return new JsonNode("study.json", "stratigraphy.units[1].thickness", JsonParser.parseString(json));
    }

    @Test
    void contributedParameterisationIsReadIntoTheKindItBuilds() throws Exception {
        UncertainValue value = UncertainValueFormat.read(node("{\"p90p10Lognormal\": {\"p90\": 52.69, \"p10\": 189.80}}"));
        // lognormal median 100, σ_ln 0.5 has P90 52.69 and P10 189.80 (exceedance convention; z0.9 = 1.28155,
        // Abramowitz and Stegun 1964, from memory)
        LogNormalValue lognormal = (LogNormalValue) value;
        assertEquals(100, lognormal.median(), 0.01);
        assertEquals(0.5, lognormal.sigmaLn(), 1e-4);
        assertEquals("{\"lognormal\":{\"median\":" + lognormal.median() + ",\"sigmaLn\":" + lognormal.sigmaLn() + "}}",
                UncertainValueFormat.write(value, Bounds.NON_NEGATIVE).toString());
    }

    @Test
    void badParametersAreReportedAtTheirJsonPath() {
        StudyFormatException unknown = assertThrows(StudyFormatException.class, () -> UncertainValueFormat.read(
                node("{\"p90p10Normal\": {\"p90\": 10, \"p50\": 20}}")));
        assertTrue(unknown.getMessage().contains("stratigraphy.units[1].thickness.p90p10Normal")
                && unknown.getMessage().contains("unknown parameter 'p50'"), unknown.getMessage());
        StudyFormatException reversed = assertThrows(StudyFormatException.class, () -> UncertainValueFormat.read(
                node("{\"p90p10Normal\": {\"p90\": 30, \"p10\": 20}}")));
        assertTrue(reversed.getMessage().contains("p10 must exceed p90"), reversed.getMessage());
        StudyFormatException missing = assertThrows(StudyFormatException.class, () -> UncertainValueFormat.read(
                node("{\"minMostLikelyMax\": {\"min\": 1, \"max\": 3}}")));
        assertTrue(missing.getMessage().contains("mostLikely"), missing.getMessage());
        StudyFormatException other = assertThrows(StudyFormatException.class, () -> UncertainValueFormat.read(
                node("{\"beta\": {\"a\": 1}}")));
        assertTrue(other.getMessage().contains("p90p10Lognormal"), other.getMessage());
    }
}
