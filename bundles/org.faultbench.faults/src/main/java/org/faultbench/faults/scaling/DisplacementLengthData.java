package org.faultbench.faults.scaling;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.DipSlip;
import org.faultbench.faults.profile.ProfileFit;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.profile.ThrowProfileFitter;
import org.faultbench.faults.profile.ThrowProfileModel;

/**
 * The (L, Dmax) points of all faults of a project, from fitted throw profiles, for plotting against the published
 * reference lines and for fitting the project's own law. Fitted rather than mapped values are used because the fit
 * extrapolates tips the data miss, which would otherwise shorten L (Kim &amp; Sanderson 2005).
 */
public final class DisplacementLengthData {

    private final List<DisplacementLengthPoint> points;
    private final List<String> skipped;

    private DisplacementLengthData(List<DisplacementLengthPoint> points, List<String> skipped) {
        this.points = List.copyOf(points);
        this.skipped = List.copyOf(skipped);
    }

    /**
     * One point per fault: each horizon's profile is fitted with {@code model} and the fit with the largest throw
     * is kept; displacement is its throw over sin(dip). Faults none of whose profiles can be fitted are listed in
     * {@link #skipped()}.
     */
    public static DisplacementLengthData collect(Map<Fault, List<ThrowProfile>> profilesByFault,
            ThrowProfileModel model) {
        ThrowProfileFitter fitter = new ThrowProfileFitter();
        List<DisplacementLengthPoint> points = new ArrayList<>();
        List<String> skipped = new ArrayList<>();
        profilesByFault.forEach((fault, profiles) -> {
            ProfileFit largest = null;
            String horizon = null;
            String lastProblem = "no throw profiles";
            for (ThrowProfile profile : profiles) {
                try {
                    ProfileFit fit = fitter.fit(profile, model);
                    if (largest == null || Math.abs(fit.maxThrow()) > Math.abs(largest.maxThrow())) {
                        largest = fit;
                        horizon = profile.horizon();
                    }
                } catch (IllegalArgumentException e) {
                    lastProblem = e.getMessage();
                }
            }
            if (largest == null) {
                skipped.add("fault '" + fault.name() + "' is not on the D-L plot: " + lastProblem);
            } else {
                double maxThrow = Math.abs(largest.maxThrow());
                points.add(new DisplacementLengthPoint(fault.id(), horizon, largest.length(), maxThrow,
                        DipSlip.displacement(maxThrow, fault.dipDegrees()), largest));
            }
        });
        return new DisplacementLengthData(points, skipped);
    }

    public List<DisplacementLengthPoint> points() {
        return points;
    }

    /** One message per fault left off the plot, saying why. */
    public List<String> skipped() {
        return skipped;
    }

    /**
     * The project's own law: least squares of log10 D on log10 L over all points. Empty with fewer than three points,
     * when all have the same length, or when D does not grow with L (no power law with n &gt; 0 fits).
     */
    public Optional<ScalingLaw> localLaw() {
        SimpleRegression regression = new SimpleRegression();
        for (DisplacementLengthPoint point : points) {
            regression.addData(Math.log10(point.length()), Math.log10(point.maxDisplacement()));
        }
        double slope = regression.getSlope();
        if (points.size() < 3 || !(slope > 0)) {
            return Optional.empty();
        }
        return Optional.of(new ScalingLaw("This project, " + points.size() + " faults",
                Math.pow(10, regression.getIntercept()), slope,
                "least squares of log10 D on log10 L of this project's fitted faults"));
    }
}
