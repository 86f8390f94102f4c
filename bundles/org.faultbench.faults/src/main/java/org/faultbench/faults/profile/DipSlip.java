package org.faultbench.faults.profile;

/**
 * Throw, heave and displacement of pure dip-slip on a plane of dip δ: displacement D = T / sin δ, heave
 * H = T / tan δ (common practice). Lets D–L data use true displacement and lets heave be estimated where no fault
 * polygon gives it.
 */
public final class DipSlip {

    private DipSlip() {
    }

    /** Dip-slip displacement (m) for throw {@code throwM} (m) on a plane dipping {@code dipDegrees}. */
    public static double displacement(double throwM, double dipDegrees) {
        return throwM / Math.sin(Math.toRadians(checkDip(dipDegrees)));
    }

    /** Heave (m, horizontal gap between the cut-offs) for throw {@code throwM}; zero on a vertical fault. */
    public static double heave(double throwM, double dipDegrees) {
        return checkDip(dipDegrees) == 90 ? 0 : throwM / Math.tan(Math.toRadians(dipDegrees));
    }

    private static double checkDip(double dipDegrees) {
        if (!(dipDegrees > 0 && dipDegrees <= 90)) {
            throw new IllegalArgumentException("fault dip must be in (0, 90] degrees, was " + dipDegrees);
        }
        return dipDegrees;
    }
}
