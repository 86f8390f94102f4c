package org.faultbench.digitize.las;

import java.util.Arrays;

import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * The gamma-ray index IGR = (GR &minus; GR<sub>clean</sub>) / (GR<sub>shale</sub> &minus; GR<sub>clean</sub>),
 * clipped to [0, 1], the first step from a gamma-ray log to shale volume (e.g. Asquith &amp; Krygowski 2004, Basic
 * Well Log Analysis, 2nd ed., AAPG Methods in Exploration 16, ch. 3; from memory).
 *
 * @param clean gamma-ray reading of clean (shale-free) rock, API units
 * @param shale gamma-ray reading of pure shale, API units, &gt; clean
 */
public record GammaRayIndex(double clean, double shale) {

    public GammaRayIndex {
        if (!Double.isFinite(clean) || !Double.isFinite(shale) || !(shale > clean)) {
            throw new IllegalArgumentException("gamma-ray baselines must be finite with shale > clean, was clean "
                    + clean + ", shale " + shale);
        }
    }

    /**
     * Baselines picked as percentiles of a log (common practice, e.g. the 5th and 95th, so that a few hot or cold
     * spikes do not set them); NaN readings are ignored. Percentiles by commons-math.
     *
     * @param gammaRay gamma-ray readings, API units, NaN for nulls
     * @param cleanPercentile percentile taken as the clean line, in (0, 100)
     * @param shalePercentile percentile taken as the shale line, in (cleanPercentile, 100]
     */
    public static GammaRayIndex fromPercentiles(double[] gammaRay, double cleanPercentile, double shalePercentile) {
        if (!(cleanPercentile > 0 && cleanPercentile < shalePercentile && shalePercentile <= 100)) {
            throw new IllegalArgumentException("percentiles must satisfy 0 < clean < shale <= 100, was clean "
                    + cleanPercentile + ", shale " + shalePercentile);
        }
        double[] readings = gammaRay == null ? new double[0]
                : Arrays.stream(gammaRay).filter(Double::isFinite).toArray();
        if (readings.length == 0) {
            throw new IllegalArgumentException("the gamma-ray log has no readings to pick baselines from");
        }
        Percentile percentile = new Percentile();
        percentile.setData(readings);
        return new GammaRayIndex(percentile.evaluate(cleanPercentile), percentile.evaluate(shalePercentile));
    }

    /** IGR of one reading, in [0, 1]; NaN stays NaN. */
    public double at(double gammaRay) {
        double index = (gammaRay - clean) / (shale - clean);
        return Double.isNaN(index) ? Double.NaN : Math.min(1, Math.max(0, index));
    }
}
