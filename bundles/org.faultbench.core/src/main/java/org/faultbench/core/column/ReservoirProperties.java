package org.faultbench.core.column;

/**
 * Resolved reservoir properties of one unit for volumetrics (one realisation or the nominal case).
 *
 * @param netToGross net-to-gross in [0, 1]
 * @param porosity porosity in [0, 1]
 * @param waterSaturation water saturation Sw in [0, 1]
 * @param oilFormationVolumeFactor Bo &ge; 1
 */
public record ReservoirProperties(double netToGross, double porosity, double waterSaturation,
        double oilFormationVolumeFactor) {

    public ReservoirProperties {
        requireFraction(netToGross, "net-to-gross");
        requireFraction(porosity, "porosity");
        requireFraction(waterSaturation, "water saturation");
        if (!(oilFormationVolumeFactor >= 1) || Double.isInfinite(oilFormationVolumeFactor)) {
            throw new IllegalArgumentException("oil formation volume factor must be a finite number >= 1, was "
                    + oilFormationVolumeFactor);
        }
    }

    /**
     * Stock-tank oil per unit gross rock volume, N/G x porosity x (1 - Sw) / Bo, so STOIIP = GRV x this
     * (the volumetric equation of common practice).
     */
    public double stockTankOilPerRockVolume() {
        return netToGross * porosity * (1 - waterSaturation) / oilFormationVolumeFactor;
    }

    /** Stock-tank oil initially in place in a gross rock volume {@code grossRockVolumeM3}, stock-tank m3. */
    public double stockTankOil(double grossRockVolumeM3) {
        if (!(grossRockVolumeM3 >= 0) || Double.isInfinite(grossRockVolumeM3)) {
            throw new IllegalArgumentException("gross rock volume must be a finite number >= 0 m3, was "
                    + grossRockVolumeM3);
        }
        return grossRockVolumeM3 * stockTankOilPerRockVolume();
    }

    private static void requireFraction(double value, String field) {
        if (!(value >= 0 && value <= 1)) {
            throw new IllegalArgumentException(field + " must be in [0, 1], was " + value);
        }
    }
}
