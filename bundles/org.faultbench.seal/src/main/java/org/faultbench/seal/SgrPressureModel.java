package org.faultbench.seal;

/** Converts shale gouge ratio into the threshold (capillary entry) pressure of the fault rock. */
@FunctionalInterface
public interface SgrPressureModel {

    /**
     * @param sgrPercent shale gouge ratio, % in [0, 100]
     * @param burialDepth burial depth of the calibration, m
     * @return threshold pressure, Pa
     */
    double thresholdPressure(double sgrPercent, double burialDepth);
}
