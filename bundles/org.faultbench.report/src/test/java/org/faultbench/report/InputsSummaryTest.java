package org.faultbench.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.MaximumSealingSsfInput;
import org.junit.jupiter.api.Test;

class InputsSummaryTest {

    @Test
    void pluginInputsAreListedWithWhatTheyActOnAndTheirDistribution() {
        Block.Table table = (Block.Table) InputsSummary.sampledInputs(List.of(
                new ContributedInput(new MaximumSealingSsfInput(), UncertainValue.triangular(4, 5, 7))));
        assertEquals(List.of(List.of("ssf-maximum-sealing", "maximum sealing SSF", "seal-criterion setting",
                "triangular(4, 5, 7)")), table.rows());
        assertEquals("inputs-sampled", table.id());
    }
}
