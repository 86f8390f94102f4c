package org.faultbench.seal.carbonate;

import java.util.Optional;

/**
 * One row of the fault-rock threshold table: the fault rock of a host facies within a porosity band.
 *
 * @param facies host facies
 * @param porosityMin lower bound of the host porosity band (inclusive), fraction
 * @param porosityMax upper bound of the host porosity band (exclusive, inclusive when 1), fraction
 * @param range the threshold pressures; empty when the fault rock earns no seal credit (juxtaposition only)
 * @param source where the row comes from, with "(from memory)" where it is
 * @param line line of the table file, for messages
 */
public record FaultRockThresholdRow(CarbonateFacies facies, double porosityMin, double porosityMax,
        Optional<ThresholdRange> range, String source, int line) {

    public FaultRockThresholdRow {
        if (facies == null || range == null || source == null || source.isBlank()) {
            throw new IllegalArgumentException("facies, range and source are required");
        }
        if (!(porosityMin >= 0 && porosityMin < porosityMax && porosityMax <= 1)) {
            throw new IllegalArgumentException("porosity band must satisfy 0 <= min < max <= 1, was [" + porosityMin
                    + ", " + porosityMax + "]");
        }
    }

    public boolean covers(double porosity) {
        return porosity >= porosityMin && (porosity < porosityMax || porosityMax == 1 && porosity == 1);
    }

    boolean overlaps(FaultRockThresholdRow other) {
        return facies == other.facies && porosityMin < other.porosityMax && other.porosityMin < porosityMax;
    }
}
