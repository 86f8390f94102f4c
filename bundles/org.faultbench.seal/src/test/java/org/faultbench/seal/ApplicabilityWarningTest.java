package org.faultbench.seal;

import static org.faultbench.seal.TestColumns.column;
import static org.faultbench.seal.TestColumns.point;
import static org.faultbench.seal.TestColumns.sand;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.junit.jupiter.api.Test;

class ApplicabilityWarningTest {

    private final ResolvedColumn column = column(sand("Sand", 50, 0.1),
            new UnitSlice("Chalk", LithologyClass.CARBONATE, false, 30, 0.05), sand("Lower sand", 50, 0.1));

    @Test
    void clayBasedRuleMeetingCarbonateWarns() {
        // clay-based rules do not apply to carbonates (Michie et al. 2014, JSG 65; common practice)
        List<ApplicabilityWarning> warnings =
                new ShaleGougeRatioCriterion().applicabilityWarnings(point(column, 100, 60));
        assertEquals(1, warnings.size());
        ApplicabilityWarning warning = warnings.get(0);
        assertEquals("sgr", warning.criterionId());
        assertEquals("Chalk", warning.unitName());
        assertEquals(LithologyClass.CARBONATE, warning.lithology());
        assertEquals("Shale gouge ratio (SGR) does not apply to carbonates (unit 'Chalk' in the throw window "
                + "[40.0, 100.0] m)", warning.message());
    }

    @Test
    void noWarningWhenTheWindowMissesTheCarbonate() {
        assertTrue(new ShaleSmearFactorCriterion().applicabilityWarnings(point(column, 130, 40)).isEmpty());
        assertTrue(new ClaySmearPotentialCriterion().applicabilityWarnings(point(column, 100, 0)).isEmpty(),
                "zero throw: nothing slipped past");
    }
}
