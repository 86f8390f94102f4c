package org.faultbench.faults.profile;

/**
 * Elliptical profile D(r) = Dmax · sqrt(1 − r²): the displacement of an elastic crack under uniform stress drop,
 * steep at the tips. Used as the reference shape for isolated faults with abrupt tips.
 */
public final class EllipticalProfile implements ThrowProfileModel {

    @Override
    public String name() {
        return "Elliptical";
    }

    @Override
    public double value(double r) {
        double a = Math.abs(r);
        return a >= 1 ? 0 : Math.sqrt(1 - a * a);
    }
}
