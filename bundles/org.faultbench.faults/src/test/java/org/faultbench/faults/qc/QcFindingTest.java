package org.faultbench.faults.qc;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class QcFindingTest {

    @Test
    void findingsWithoutPositionConcernTheWholeFault() {
        assertFalse(new QcFinding("r", Severity.WARNING, "f1", Double.NaN, null, "m", "s").hasPosition());
        assertTrue(new QcFinding("r", Severity.WARNING, "f1", 10, "Top A", "m", "s").hasPosition());
    }

    @Test
    void incompleteFindingsAreRejectedNamingTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new QcFinding("r", Severity.WARNING, "f1", 0, null, " ", "s"));
        assertTrue(e.getMessage().contains("message"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new QcFinding("r", null, "f1", 0, null, "m", "s"));
        assertTrue(e.getMessage().contains("severity"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new QcFinding("r", Severity.ERROR, "f1", Double.POSITIVE_INFINITY, null, "m", "s"));
    }
}
