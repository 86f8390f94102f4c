package org.faultbench.digitize.las;

/**
 * Ways to turn the gamma-ray index IGR ({@link GammaRayIndex}) into shale volume Vsh, a fraction. Which one applies
 * depends on the rocks and must be recorded with every Vsh (common practice). The Larionov forms are from Larionov
 * 1969 (Borehole Radiometry, Nedra, Moscow), as given in Asquith &amp; Krygowski 2004, Basic Well Log Analysis, 2nd
 * ed., AAPG Methods in Exploration 16, ch. 3 (from memory).
 */
public enum VShaleTransform {
    /** Vsh = IGR: an upper bound, since the gamma-ray response is not linear in shale volume. */
    LINEAR {
        @Override
        public double vshale(double gammaRayIndex) {
            return checked(gammaRayIndex);
        }
    },
    /** Vsh = 0.083 (2^(3.7 IGR) &minus; 1): Tertiary, unconsolidated rocks. */
    LARIONOV_TERTIARY {
        @Override
        public double vshale(double gammaRayIndex) {
            return 0.083 * (Math.pow(2, 3.7 * checked(gammaRayIndex)) - 1);
        }
    },
    /** Vsh = 0.33 (2^(2 IGR) &minus; 1): older, consolidated rocks. */
    LARIONOV_OLDER_ROCKS {
        @Override
        public double vshale(double gammaRayIndex) {
            return 0.33 * (Math.pow(2, 2 * checked(gammaRayIndex)) - 1);
        }
    };

    /** Vsh for a gamma-ray index in [0, 1]; NaN stays NaN. */
    public abstract double vshale(double gammaRayIndex);

    /** A Vsh log from a gamma-ray log: IGR by {@code index}, then this transform; NaN readings stay NaN. */
    public double[] vshaleLog(double[] gammaRay, GammaRayIndex index) {
        if (gammaRay == null || index == null) {
            throw new IllegalArgumentException("gamma-ray log or baselines missing");
        }
        double[] vshale = new double[gammaRay.length];
        for (int k = 0; k < gammaRay.length; k++) {
            vshale[k] = vshale(index.at(gammaRay[k]));
        }
        return vshale;
    }

    private static double checked(double gammaRayIndex) {
        if (gammaRayIndex < 0 || gammaRayIndex > 1) {
            throw new IllegalArgumentException("gamma-ray index must be in [0, 1], was " + gammaRayIndex);
        }
        return gammaRayIndex;
    }
}
