package org.faultbench.seal.carbonate;

/**
 * A range of fault-rock threshold (capillary entry) pressures, Pa, as published ranges are given: lowest, most
 * likely and highest value.
 */
public record ThresholdRange(double minPa, double modePa, double maxPa) {

    public ThresholdRange {
        if (!(minPa >= 0 && minPa <= modePa && modePa <= maxPa) || Double.isInfinite(maxPa)) {
            throw new IllegalArgumentException("threshold range must satisfy 0 <= min <= mode <= max < infinity, was "
                    + minPa + ", " + modePa + ", " + maxPa + " Pa");
        }
    }

    public double value(ThresholdCase which) {
        return switch (which) {
            case MIN -> minPa;
            case MODE -> modePa;
            case MAX -> maxPa;
        };
    }
}
