package org.faultbench.faults.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Synthetic profiles with known maximum throw 120 m, centre 2300 m and half-length 1500 m (length 3000 m), sampled
 * every 50 m with 3 m Gaussian noise (fixed seed), must give back their parameters.
 */
class ThrowProfileFitterTest {

    private static final double DMAX = 120;
    private static final double CENTRE = 2300;
    private static final double HALF_LENGTH = 1500;
    private static final double NOISE = 3;

    private final ThrowProfileFitter fitter = new ThrowProfileFitter();

    private static ThrowProfile synthetic(ThrowProfileModel model, double dmax, double fromU, long seed) {
        Random random = new Random(seed);
        int n = (int) Math.round((CENTRE + HALF_LENGTH - fromU) / 50) + 1;
        double[] u = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = fromU + 50.0 * i;
            t[i] = dmax * model.value((u[i] - CENTRE) / HALF_LENGTH) + NOISE * random.nextGaussian();
        }
        return new ThrowProfile("f1", "Top A", u, t);
    }

    private static void assertRecovered(ProfileFit fit, double dmax) {
        String what = fit.model().name();
        assertEquals(dmax, fit.maxThrow(), 3, what + ": maximum throw");
        assertEquals(CENTRE, fit.centreU(), 40, what + ": centre");
        assertEquals(2 * HALF_LENGTH, fit.length(), 90, what + ": length (3 %)");
        assertTrue(fit.rmsResidual() > 2 && fit.rmsResidual() < 4, what + ": RMS residual " + fit.rmsResidual()
                + " should be about the 3 m noise");
    }

    @Test
    void eachShapeRecoversItsOwnSyntheticProfile() {
        long seed = 11;
        for (ThrowProfileModel model : ThrowProfileModel.builtIns()) {
            ThrowProfile profile = synthetic(model, DMAX, CENTRE - HALF_LENGTH, seed++);
            assertRecovered(fitter.fit(profile, model), DMAX);
        }
    }

    @Test
    void fitExtrapolatesATipTheDataDoNotReach() {
        // data start 600 m inside the low-u tip (u = 800 m): the fitted length still finds the 3000 m fault
        for (ThrowProfileModel model : ThrowProfileModel.builtIns()) {
            ProfileFit fit = fitter.fit(synthetic(model, DMAX, 1400, 23), model);
            assertRecovered(fit, DMAX);
            assertEquals(800, fit.startU(), 90, model.name() + ": low-u tip");
        }
    }

    @Test
    void reverseThrowIsFittedWithANegativeMaximum() {
        ProfileFit fit = fitter.fit(synthetic(new BellProfile(), -DMAX, CENTRE - HALF_LENGTH, 5), new BellProfile());
        assertRecovered(fit, -DMAX);
    }

    @Test
    void bestFitPicksTheShapeTheDataCameFrom() {
        ThrowProfile bellData = synthetic(new BellProfile(), DMAX, CENTRE - HALF_LENGTH, 3);
        ProfileFit best = fitter.bestFit(bellData, ThrowProfileModel.builtIns());
        assertEquals(new BellProfile().name(), best.model().name());
        ProfileFit ellipse = fitter.fit(bellData, new EllipticalProfile());
        assertTrue(ellipse.rmsResidual() > 1.5 * best.rmsResidual(), "the elliptical shape fits bell data worse: "
                + ellipse.rmsResidual() + " vs " + best.rmsResidual());
    }

    @Test
    void fittedProfileGivesTheModelValueAtSetPositions() {
        ProfileFit fit = new ProfileFit(new BellProfile(), 200, 1000, 500, 0, 10);
        // Walsh & Watterson 1987 bell (formula from memory): 0.5590 Dmax at r = 0.5, i.e. 250 m from the centre
        assertEquals(111.80, fit.throwAt(1250), 0.01);
        assertEquals(111.80, fit.throwAt(750), 0.01);
        assertEquals(0, fit.throwAt(1600), 0);
    }

    @Test
    void tooFewStationsOrNoThrowCannotBeFitted() {
        ThrowProfile threeStations = new ThrowProfile("f1", "Top A", new double[] {0, 1, 2}, new double[] {1, 2, 1});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> fitter.fit(threeStations, new BellProfile()));
        assertTrue(e.getMessage().contains("at least 4"), e.getMessage());
        ThrowProfile flat = new ThrowProfile("f1", "Top A", new double[] {0, 1, 2, 3}, new double[] {0, 0, 0, 0});
        assertThrows(IllegalArgumentException.class, () -> fitter.fit(flat, new BellProfile()));
    }
}
