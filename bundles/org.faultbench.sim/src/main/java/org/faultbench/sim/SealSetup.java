package org.faultbench.sim;

import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.seal.JuxtapositionOnlyCriterion;
import org.faultbench.seal.SealCriterion;

/**
 * How fault rock is judged.
 *
 * @param criterion the seal criterion evaluated at fault-plane points
 * @param burialDepth burial depth for the criterion's calibration, m
 * @param calibrationShift uncertainty of the calibration in log10 units: each realisation's threshold pressures are
 *        multiplied by 10^(−shift). For the Bretan et al. (2003) envelope 10^(SGR/27 − C) this is exactly an
 *        uncertainty of the constant C.
 * @param thresholdScale factor applied to every threshold pressure, e.g. the interfacial-tension and contact-angle
 *        scaling from an oil–brine calibration to a CO2–brine system (1 for the calibration's own fluid)
 */
public record SealSetup(SealCriterion criterion, double burialDepth, UncertainValue calibrationShift,
        double thresholdScale) {

    public SealSetup {
        if (criterion == null) {
            throw new IllegalArgumentException("seal criterion is missing");
        }
        if (!(burialDepth >= 0) || Double.isInfinite(burialDepth)) {
            throw new IllegalArgumentException("burial depth must be a finite number >= 0 m, was " + burialDepth);
        }
        if (calibrationShift == null) {
            calibrationShift = UncertainValue.fixed(0);
        }
        if (!(thresholdScale > 0) || Double.isInfinite(thresholdScale)) {
            throw new IllegalArgumentException("threshold scale must be a finite number > 0, was " + thresholdScale);
        }
    }

    /** Whether only juxtaposition decides (reservoir against reservoir leaks at 0 Pa): no fault-rock evaluation. */
    public boolean juxtapositionOnly() {
        return criterion instanceof JuxtapositionOnlyCriterion;
    }
}
