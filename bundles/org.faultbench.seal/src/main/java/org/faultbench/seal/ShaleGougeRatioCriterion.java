package org.faultbench.seal;

/**
 * Shale gouge ratio (Yielding, Freeman &amp; Needham 1997): the clay fraction of the rock that slipped past the
 * point, assuming complete mixing, SGR = sum(Vcl_i dz_i) / T x 100 % over the throw window (units clipped to the
 * window). The threshold pressure comes from a pluggable {@link SgrPressureModel}, by default
 * {@link BretanCapacity}.
 */
public final class ShaleGougeRatioCriterion extends ClayBasedCriterion {

    public static final String ID = "sgr";

    private final SgrPressureModel pressureModel;

    /** SGR with the Bretan et al. (2003) envelope. */
    public ShaleGougeRatioCriterion() {
        this(new BretanCapacity());
    }

    public ShaleGougeRatioCriterion(SgrPressureModel pressureModel) {
        if (pressureModel == null) {
            throw new IllegalArgumentException("SGR criterion: pressure model is missing");
        }
        this.pressureModel = pressureModel;
    }

    public SgrPressureModel pressureModel() {
        return pressureModel;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Shale gouge ratio (SGR)";
    }

    @Override
    protected String attributeName() {
        return "SGR";
    }

    @Override
    protected String attributeUnit() {
        return "%";
    }

    @Override
    protected double attribute(ThrowWindow window) {
        double clay = 0;
        for (int index : window.unitsInside()) {
            clay += window.overlap(index) * window.column().unit(index).clayFraction();
        }
        return 100 * clay / window.length();
    }

    @Override
    protected double faultRockThreshold(double attribute, FaultPointContext ctx) {
        return pressureModel.thresholdPressure(attribute, ctx.burialDepth());
    }
}
