package org.faultbench.faults.profile;

/**
 * Bell-shaped profile of Walsh &amp; Watterson (1987, J. Struct. Geol. 9): D(r) = 2 · Dmax · (1 − r) ·
 * sqrt(((1 + r) / 2)² − r²) for r = |distance from centre| / half-length in [0, 1]. Its tips taper gently, as on
 * most mapped normal faults. The formula is as recalled (from memory), checked against its own values at r = 0.25,
 * 0.5 and 0.75 (0.8592, 0.5590, 0.2253 of Dmax).
 */
public final class BellProfile implements ThrowProfileModel {

    @Override
    public String name() {
        return "Bell (Walsh & Watterson 1987)";
    }

    @Override
    public double value(double r) {
        double a = Math.abs(r);
        if (a >= 1) {
            return 0;
        }
        double half = (1 + a) / 2;
        return 2 * (1 - a) * Math.sqrt(half * half - a * a);
    }
}
