package org.faultbench.seal;

/**
 * Shale smear factor (Lindsay, Murphy, Walsh &amp; Watterson 1993): SSF = T / t, throw over the thickness of a shale
 * source bed (a unit of lithology class SEAL) that has slipped past the point. SSF is not additive, so the smallest
 * (most sealing) value of the beds in the throw window is reported; with no shale bed it is +infinity.
 *
 * <p>Threshold, a simple binary rule: the smear is taken as continuous and sealing (+infinity) where
 * SSF &le; the maximum sealing SSF, and as absent (0 Pa) above it. Default maximum 4, after Gibson (1994); Lindsay et
 * al. (1993) found smears may become incomplete above 7.
 */
public final class ShaleSmearFactorCriterion extends ClayBasedCriterion {

    public static final String ID = "ssf";
    /** Largest SSF still taken as a continuous smear by default (Gibson 1994). */
    public static final double DEFAULT_MAXIMUM_SEALING_SSF = 4;

    /**
     * Id of the sampled input that, when a study includes it, draws the maximum sealing SSF per realisation instead
     * of the fixed setting (the input itself is contributed by the simulator bundle).
     */
    public static final String SAMPLED_MAXIMUM_ID = "ssf-maximum-sealing";

    private final double maximumSealingSsf;

    public ShaleSmearFactorCriterion() {
        this(DEFAULT_MAXIMUM_SEALING_SSF);
    }

    public ShaleSmearFactorCriterion(double maximumSealingSsf) {
        if (!(maximumSealingSsf > 0) || Double.isInfinite(maximumSealingSsf)) {
            throw new IllegalArgumentException("SSF criterion: maximum sealing SSF must be a finite number > 0, was "
                    + maximumSealingSsf);
        }
        this.maximumSealingSsf = maximumSealingSsf;
    }

    public double maximumSealingSsf() {
        return maximumSealingSsf;
    }

    /** With the realisation's maximum sealing SSF when the study samples {@value #SAMPLED_MAXIMUM_ID}. */
    @Override
    public SealCriterion forRealisation(SampledValues values) {
        var drawn = values.value(SAMPLED_MAXIMUM_ID);
        return drawn.isPresent() ? new ShaleSmearFactorCriterion(drawn.getAsDouble()) : this;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Shale smear factor (SSF)";
    }

    @Override
    protected String attributeName() {
        return "SSF";
    }

    @Override
    protected String attributeUnit() {
        return "";
    }

    @Override
    protected double attribute(ThrowWindow window) {
        double thickest = 0;
        for (int index : window.shaleBedsInside()) {
            thickest = Math.max(thickest, window.column().unit(index).thickness());
        }
        return thickest > 0 ? window.length() / thickest : Double.POSITIVE_INFINITY;
    }

    @Override
    protected double faultRockThreshold(double attribute, FaultPointContext ctx) {
        return attribute <= maximumSealingSsf ? Double.POSITIVE_INFINITY : 0;
    }
}
