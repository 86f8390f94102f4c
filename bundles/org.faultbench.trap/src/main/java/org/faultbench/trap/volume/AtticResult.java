package org.faultbench.trap.volume;

import org.faultbench.core.units.VolumeUnit;

/**
 * Original and attic (left behind after depletion) columns and volumes of a compartment.
 *
 * @param originalColumn original contact minus crest, metres
 * @param contactAfterDepletion depth the contact rises to once the drained block is produced, metres
 * @param atticColumn contact after depletion minus crest, never below 0, metres
 * @param originalGrossRockVolume gross rock volume above the original contact, m3
 * @param atticGrossRockVolume gross rock volume between crest and contact after depletion, m3
 * @param originalOilInPlace stock-tank oil initially in place, stock-tank m3
 * @param atticOilInPlace stock-tank oil in the attic, stock-tank m3
 */
public record AtticResult(double originalColumn, double contactAfterDepletion, double atticColumn,
        double originalGrossRockVolume, double atticGrossRockVolume, double originalOilInPlace,
        double atticOilInPlace) {

    /** Original oil in place in stock-tank barrels. */
    public double originalOilInPlaceBarrels() {
        return VolumeUnit.BARREL.fromCubicMetres(originalOilInPlace);
    }

    /** Attic oil in stock-tank barrels. */
    public double atticOilInPlaceBarrels() {
        return VolumeUnit.BARREL.fromCubicMetres(atticOilInPlace);
    }

    /** Attic share of the original oil in place, 0 when the compartment held none. */
    public double atticFraction() {
        return originalOilInPlace > 0 ? atticOilInPlace / originalOilInPlace : 0;
    }
}
