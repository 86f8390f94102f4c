package org.faultbench.faults.profile;

import java.util.List;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer.Optimum;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.RealVector;

/**
 * Fits a {@link ThrowProfileModel} to a measured throw profile by non-linear least squares (Levenberg–Marquardt),
 * solving for maximum throw, centre and half-length. The fitted length is the fault length the D–L plot needs even
 * where the mapped data stop short of the tips.
 */
public final class ThrowProfileFitter {

    /** Three parameters need at least one more station than that to leave a residual. */
    private static final int MIN_STATIONS = 4;
    private static final int MAX_EVALUATIONS = 10_000;
    /** Step of the numerical derivative of the normalised shape. */
    private static final double SHAPE_STEP = 1e-6;
    /** Smallest half-length (m) the optimizer may try, so that the normalised position stays defined. */
    private static final double MIN_HALF_LENGTH = 1e-3;

    /**
     * @throws IllegalArgumentException when the profile has fewer than four stations with data, no throw at all, or
     *     the fit does not converge
     */
    public ProfileFit fit(ThrowProfile profile, ThrowProfileModel model) {
        double[] u = profile.validU();
        double[] t = profile.validThrows();
        String what = "throw profile of horizon '" + profile.horizon() + "' on fault '" + profile.faultId() + "'";
        if (u.length < MIN_STATIONS) {
            throw new IllegalArgumentException(what + ": a profile fit needs at least " + MIN_STATIONS
                    + " stations with data, has " + u.length);
        }
        if (!(profile.maxAbsThrow() > 0)) {
            throw new IllegalArgumentException(what + ": throw is zero everywhere, there is no profile to fit");
        }
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(initialGuess(u, t))
                .target(t)
                .model(point -> values(model, u, point), point -> jacobian(model, u, point))
                .parameterValidator(ThrowProfileFitter::keepHalfLengthPositive)
                .maxEvaluations(MAX_EVALUATIONS)
                .maxIterations(MAX_EVALUATIONS)
                .build();
        try {
            Optimum optimum = new LevenbergMarquardtOptimizer().optimize(problem);
            double[] p = optimum.getPoint().toArray();
            return new ProfileFit(model, p[0], p[1], p[2], optimum.getRMS(), u.length);
        } catch (MathIllegalStateException e) {
            throw new IllegalArgumentException(what + ": the " + model.name() + " profile could not be fitted ("
                    + e.getMessage() + ")", e);
        }
    }

    /**
     * The best of several shapes: the fit with the smallest RMS residual. Shapes that cannot be fitted are passed
     * over.
     *
     * @throws IllegalArgumentException when no shape can be fitted; the message is that of the last failure
     */
    public ProfileFit bestFit(ThrowProfile profile, List<ThrowProfileModel> models) {
        ProfileFit best = null;
        IllegalArgumentException lastFailure = new IllegalArgumentException("no profile shapes to fit");
        for (ThrowProfileModel model : models) {
            try {
                ProfileFit fit = fit(profile, model);
                if (best == null || fit.rmsResidual() < best.rmsResidual()) {
                    best = fit;
                }
            } catch (IllegalArgumentException e) {
                lastFailure = e;
            }
        }
        if (best == null) {
            throw lastFailure;
        }
        return best;
    }

    /** Centre at the throw-weighted mean position, half-length just covering every station, peak at the data's. */
    private static double[] initialGuess(double[] u, double[] t) {
        double weight = 0;
        double moment = 0;
        int peak = 0;
        for (int i = 0; i < u.length; i++) {
            weight += Math.abs(t[i]);
            moment += Math.abs(t[i]) * u[i];
            if (Math.abs(t[i]) > Math.abs(t[peak])) {
                peak = i;
            }
        }
        double centre = moment / weight;
        double spacing = (u[u.length - 1] - u[0]) / (u.length - 1);
        double halfLength = Math.max(centre - u[0], u[u.length - 1] - centre) + spacing;
        return new double[] {t[peak], centre, halfLength};
    }

    private static RealVector keepHalfLengthPositive(RealVector point) {
        RealVector checked = point.copy();
        checked.setEntry(2, Math.max(Math.abs(point.getEntry(2)), MIN_HALF_LENGTH));
        return checked;
    }

    private static double[] values(ThrowProfileModel model, double[] u, double[] p) {
        double[] result = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            result[i] = p[0] * model.value((u[i] - p[1]) / p[2]);
        }
        return result;
    }

    /** Analytic in the shape's value, numeric (central difference) in its slope, so any shape can be fitted. */
    private static double[][] jacobian(ThrowProfileModel model, double[] u, double[] p) {
        double[][] result = new double[u.length][];
        for (int i = 0; i < u.length; i++) {
            double r = (u[i] - p[1]) / p[2];
            double slope = (model.value(r + SHAPE_STEP) - model.value(r - SHAPE_STEP)) / (2 * SHAPE_STEP);
            result[i] = new double[] {model.value(r), -p[0] * slope / p[2], -p[0] * slope * r / p[2]};
        }
        return result;
    }
}
