package org.faultbench.faults.qc;

/**
 * One problem a QC rule found on a fault: where it is and what a geologist can do about it.
 *
 * @param ruleId id of the rule that found it
 * @param severity how sure the rule is that something is wrong
 * @param faultId id of the fault
 * @param u along-strike distance (m) of the problem, NaN when it concerns the whole fault
 * @param horizon horizon concerned, null when it concerns no single horizon
 * @param message what is wrong, with the numbers that show it
 * @param suggestion what to check or do next
 */
public record QcFinding(String ruleId, Severity severity, String faultId, double u, String horizon, String message,
        String suggestion) {

    public QcFinding {
        requireText(ruleId, "rule id", ruleId);
        requireText(faultId, "fault id", ruleId);
        requireText(message, "message", ruleId);
        requireText(suggestion, "suggestion", ruleId);
        if (severity == null) {
            throw new IllegalArgumentException("QC finding of rule '" + ruleId + "': severity is missing");
        }
        if (Double.isInfinite(u)) {
            throw new IllegalArgumentException("QC finding of rule '" + ruleId + "': position u = " + u
                    + " must be finite or NaN");
        }
    }

    private static void requireText(String value, String field, String ruleId) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException("QC finding of rule '" + ruleId + "': " + field + " is empty");
        }
    }

    /** Whether the finding points at a place along strike rather than at the whole fault. */
    public boolean hasPosition() {
        return !Double.isNaN(u);
    }
}
