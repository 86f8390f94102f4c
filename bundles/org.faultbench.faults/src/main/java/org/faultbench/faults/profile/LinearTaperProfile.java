package org.faultbench.faults.profile;

/**
 * Linear taper D(r) = Dmax · (1 − |r|): a triangular profile with constant throw gradient towards both tips, the
 * simplest shape that fits many small faults.
 */
public final class LinearTaperProfile implements ThrowProfileModel {

    @Override
    public String name() {
        return "Linear taper";
    }

    @Override
    public double value(double r) {
        double a = Math.abs(r);
        return a >= 1 ? 0 : 1 - a;
    }
}
