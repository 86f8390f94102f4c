package org.faultbench.faults.profile;

/**
 * A theoretical profile fitted to measured throws: the fault's maximum throw, centre and half-length as the profile
 * shape sees them, which extrapolates tips that the data do not reach.
 *
 * @param model the fitted shape
 * @param maxThrow throw at the centre (m); negative when the hanging wall is up
 * @param centreU along-strike distance of the centre (m)
 * @param halfLength distance from centre to either tip (m), &gt; 0
 * @param rmsResidual root-mean-square misfit of the measured throws (m)
 * @param stations number of stations with data that were fitted
 */
public record ProfileFit(ThrowProfileModel model, double maxThrow, double centreU, double halfLength,
        double rmsResidual, int stations) {

    public ProfileFit {
        if (model == null) {
            throw new IllegalArgumentException("profile fit: model is missing");
        }
        if (!(halfLength > 0) || Double.isInfinite(halfLength)) {
            throw new IllegalArgumentException("profile fit (" + model.name() + "): half-length must be a finite"
                    + " number > 0, was " + halfLength);
        }
    }

    /** Tip-to-tip length 2 · half-length (m). */
    public double length() {
        return 2 * halfLength;
    }

    /** Along-strike distance of the tip on the low-u side. */
    public double startU() {
        return centreU - halfLength;
    }

    /** Along-strike distance of the tip on the high-u side. */
    public double endU() {
        return centreU + halfLength;
    }

    /** Throw the fitted profile predicts at along-strike distance {@code u}. */
    public double throwAt(double u) {
        return maxThrow * model.value((u - centreU) / halfLength);
    }
}
