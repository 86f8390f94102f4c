package org.faultbench.faults.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class ThrowProfileModelTest {

    private static final double EPS = 5e-5;

    @Test
    void bellProfileMatchesItsRecalledValues() {
        ThrowProfileModel bell = new BellProfile();
        // Walsh & Watterson 1987, J. Struct. Geol. 9: D(r) = 2(1 - r) sqrt(((1 + r)/2)^2 - r^2) (formula from memory);
        // hand calculation of that formula: 1.5 sqrt(0.328125), sqrt(0.3125), 0.5 sqrt(0.203125)
        assertEquals(1, bell.value(0), EPS, "centre");
        assertEquals(0.8592, bell.value(0.25), EPS, "r = 0.25");
        assertEquals(0.5590, bell.value(0.5), EPS, "r = 0.5");
        assertEquals(0.2253, bell.value(0.75), EPS, "r = 0.75");
        assertEquals(0, bell.value(1), EPS, "tip");
    }

    @Test
    void ellipticalProfileIsAQuarterEllipse() {
        ThrowProfileModel ellipse = new EllipticalProfile();
        // elastic crack profile sqrt(1 - r^2) (from memory); hand calculation
        assertEquals(0.9682, ellipse.value(0.25), EPS, "sqrt(0.9375)");
        assertEquals(0.8660, ellipse.value(0.5), EPS, "sqrt(0.75)");
        assertEquals(0.6614, ellipse.value(0.75), EPS, "sqrt(0.4375)");
        assertEquals(0, ellipse.value(1), EPS, "tip");
    }

    @Test
    void linearTaperFallsEvenlyToTheTips() {
        ThrowProfileModel taper = new LinearTaperProfile();
        // linear taper 1 - r (Muraoka & Kamata 1983, from memory); hand calculation
        assertEquals(0.75, taper.value(0.25), EPS);
        assertEquals(0.5, taper.value(0.5), EPS);
        assertEquals(0.25, taper.value(0.75), EPS);
    }

    @Test
    void everyBuiltInShapeIsSymmetricAndZeroBeyondTheTips() {
        List<ThrowProfileModel> models = ThrowProfileModel.builtIns();
        assertEquals(3, models.size());
        for (ThrowProfileModel model : models) {
            for (double r : new double[] {0.1, 0.4, 0.9}) {
                assertEquals(model.value(r), model.value(-r), 1e-12, model.name() + " symmetric at r = " + r);
            }
            assertEquals(0, model.value(1.2), 0, model.name() + " beyond the tip");
            assertEquals(0, model.value(-3), 0, model.name() + " beyond the other tip");
        }
    }
}
