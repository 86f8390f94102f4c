package org.faultbench.seal;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.UnitSlice;

/**
 * A seal criterion met a unit it was not calibrated for, typically a clay-based rule meeting carbonates or
 * evaporites, whose fault rocks do not form by mixing clay. The result is still computed; the geologist decides.
 *
 * @param criterionId the criterion that was used
 * @param unitName the unit in the throw window
 * @param lithology that unit's lithology class
 * @param message the warning for the user
 */
public record ApplicabilityWarning(String criterionId, String unitName, LithologyClass lithology, String message) {

    static ApplicabilityWarning of(SealCriterion criterion, UnitSlice unit, ThrowWindow window) {
        String message = criterion.name() + " does not apply to " + describe(unit.lithology()) + " (unit '"
                + unit.name() + "' in the throw window [" + window.top() + ", " + window.base() + "] m)";
        return new ApplicabilityWarning(criterion.id(), unit.name(), unit.lithology(), message);
    }

    private static String describe(LithologyClass lithology) {
        return switch (lithology) {
            case RESERVOIR -> "reservoir rocks";
            case SEAL -> "shales and mudstones";
            case CARBONATE -> "carbonates";
            case EVAPORITE -> "evaporites";
            case OTHER -> "non-clastic rocks";
        };
    }
}
