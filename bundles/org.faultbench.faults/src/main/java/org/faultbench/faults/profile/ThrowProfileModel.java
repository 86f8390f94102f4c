package org.faultbench.faults.profile;

import java.util.List;

/**
 * The shape of an idealised throw profile along strike, normalised so that it can be fitted to any fault: throw is
 * {@code Dmax · value(r)} with r the along-strike distance from the profile centre divided by the half-length.
 * In-house shapes can be added by implementing this interface; the fitter needs nothing else.
 */
public interface ThrowProfileModel {

    /** Name shown to the user, e.g. in a legend. */
    String name();

    /**
     * Normalised throw at normalised position {@code r}: 1 at the centre (r = 0), 0 at the tips (|r| = 1) and beyond,
     * symmetric about the centre.
     */
    double value(double r);

    /** The shapes shipped with the workbench: elliptical, bell (Walsh &amp; Watterson 1987) and linear taper. */
    static List<ThrowProfileModel> builtIns() {
        return List.of(new EllipticalProfile(), new BellProfile(), new LinearTaperProfile());
    }
}
