package org.faultbench.seal;

/** The valid range of shale gouge ratio, shared by the SGR pressure models. */
final class SgrChecks {

    private SgrChecks() {
    }

    static void requirePercent(double sgrPercent) {
        if (!(sgrPercent >= 0 && sgrPercent <= 100)) {
            throw new IllegalArgumentException("SGR must be in [0, 100] %, was " + sgrPercent);
        }
    }
}
