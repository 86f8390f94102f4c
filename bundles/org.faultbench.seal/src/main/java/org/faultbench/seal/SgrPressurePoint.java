package org.faultbench.seal;

/**
 * One row of a user-defined SGR to threshold-pressure table.
 *
 * @param sgrPercent shale gouge ratio, % in [0, 100]
 * @param pressure threshold pressure, Pa, finite and &ge; 0
 */
public record SgrPressurePoint(double sgrPercent, double pressure) {

    public SgrPressurePoint {
        SgrChecks.requirePercent(sgrPercent);
        if (!(pressure >= 0) || Double.isInfinite(pressure)) {
            throw new IllegalArgumentException("SGR table row at " + sgrPercent
                    + " %: pressure must be a finite number >= 0 Pa, was " + pressure);
        }
    }
}
