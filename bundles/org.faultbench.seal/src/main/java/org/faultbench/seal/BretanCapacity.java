package org.faultbench.seal;

import org.faultbench.core.units.PressureUnit;

/**
 * Seal-failure envelope of Bretan, Yielding &amp; Jones (2003): fault-zone threshold pressure
 * FZP (bar) = 10^(SGR / 27 - C), SGR in %, with C stepping down as burial depth increases:
 * C = 0.5 shallower than 3.0 km, 0.25 from 3.0 to 3.5 km, 0 deeper than 3.5 km.
 *
 * <p>The depth bands are as recalled (from memory) and must be checked against the paper before being relied on. The
 * envelope is an empirical calibration of clastic sand-shale sequences; other basins need local calibration.
 */
public final class BretanCapacity implements SgrPressureModel {

    /** Top of the middle depth band, m. */
    public static final double SHALLOW_BAND_BASE = 3000;
    /** Base of the middle depth band, m. */
    public static final double DEEP_BAND_TOP = 3500;

    @Override
    public double thresholdPressure(double sgrPercent, double burialDepth) {
        SgrChecks.requirePercent(sgrPercent);
        return PressureUnit.BAR.toPascals(Math.pow(10, sgrPercent / 27 - depthConstant(burialDepth)));
    }

    /** The constant C for {@code burialDepth} metres: 0.5 below 3000 m, 0.25 from 3000 to 3500 m, 0 beyond. */
    public static double depthConstant(double burialDepth) {
        if (!(burialDepth >= 0) || Double.isInfinite(burialDepth)) {
            throw new IllegalArgumentException("burial depth must be a finite number >= 0 m, was " + burialDepth);
        }
        if (burialDepth < SHALLOW_BAND_BASE) {
            return 0.5;
        }
        return burialDepth <= DEEP_BAND_TOP ? 0.25 : 0;
    }
}
